import { describe, expect, it } from 'vitest';
import { authForwardedHeaders, useSecureCookies } from '../../../src/lib/server/auth/public-origin';
import { loadConfig } from '../../../src/lib/server/config';

const app = new URL('https://phosforge.kestrelhollow.example/signin');
const spoofed = new Headers({ host: 'evil.example', 'x-forwarded-host': 'evil.example', 'x-forwarded-proto': 'http' });

describe('the origin Auth.js builds its URLs from', () => {
  it('is the app origin, whatever the client sends, by default', () => {
    expect(authForwardedHeaders(app, spoofed, false)).toEqual({ host: 'phosforge.kestrelhollow.example', proto: 'https' });
  });

  it('follows the forwarded headers only when the proxy is declared trusted', () => {
    expect(authForwardedHeaders(app, spoofed, true)).toEqual({ host: 'evil.example', proto: 'http' });
    expect(authForwardedHeaders(app, new Headers(), true)).toEqual({ host: 'phosforge.kestrelhollow.example', proto: 'https' });
  });

  it('is configured by TRUST_PROXY_HOST, off unless set to 1', () => {
    expect(loadConfig({}).trustProxyHost).toBe(false);
    expect(loadConfig({ TRUST_PROXY_HOST: '0' }).trustProxyHost).toBe(false);
    expect(loadConfig({ TRUST_PROXY_HOST: '1' }).trustProxyHost).toBe(true);
    expect(() => loadConfig({ TRUST_PROXY_HOST: 'yes' })).toThrow(/TRUST_PROXY_HOST must be 0 or 1/);
  });
});

describe('Secure session cookies', () => {
  // RFC 6265bis §4.1.2.5: a user agent ignores Secure cookies set over plain http, so Secure
  // follows the public scheme, not NODE_ENV.
  it.each([
    ['https', true],
    ['https:', true],
    ['http', false],
    ['http:', false]
  ])('public scheme %s gives Secure = %s', (proto, secure) => {
    expect(useSecureCookies(proto)).toBe(secure);
  });

  it('follows ORIGIN, not a forwarded scheme from an untrusted client', () => {
    const proto = authForwardedHeaders(app, spoofed, false).proto;
    expect(useSecureCookies(proto)).toBe(true);
    const loopback = new URL('http://127.0.0.1:4173/');
    expect(useSecureCookies(authForwardedHeaders(loopback, new Headers({ 'x-forwarded-proto': 'https' }), false).proto)).toBe(false);
  });
});
