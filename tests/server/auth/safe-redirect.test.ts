import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { safeRedirect } from '../../../src/lib/server/auth/safe-redirect';

const ORIGIN = 'https://phosforge.kestrelhollow.example';

describe('the path followed after sign-in', () => {
  // WHATWG URL Standard: for special schemes "\" counts as "/", and tab/LF/CR are removed before
  // parsing, so each of these reaches another host once a browser resolves it.
  const hostile: [string, string][] = [
    ['/\\evil.example', 'backslash read as a slash (WHATWG URL); ?redirectTo=/%5Cevil.example decodes to it'],
    ['/\t/evil.example', 'tab removed by the URL parser (WHATWG URL)'],
    ['/\n/evil.example', 'line feed removed by the URL parser (WHATWG URL)'],
    ['/\r/evil.example', 'carriage return removed by the URL parser (WHATWG URL)'],
    ['//evil.example', 'scheme-relative URL (RFC 3986 §4.2)'],
    ['//evil.example/signin', 'scheme-relative URL with a path (RFC 3986 §4.2)'],
    ['/\\/evil.example', 'slash-backslash'],
    ['\\\\evil.example', 'two backslashes'],
    ['https://evil.example/', 'absolute URL on another host'],
    ['http://phosforge.kestrelhollow.example/', 'same host, other scheme'],
    ['javascript:alert(1)', 'script URL'],
    ['data:text/html,hi', 'data URL'],
    ['evil.example', 'relative without a leading slash'],
    ['/.//evil.example', 'dot segment collapsing to //host (RFC 3986 §5.2.4)'],
    ['/./\\evil.example', 'dot segment before a backslash'],
    ['/\u0000/evil.example', 'NUL'],
    ['', 'empty'],
    [' /admin', 'leading space']
  ];
  it.each(hostile)('%j (%s) falls back to /', (target) => {
    expect(safeRedirect(target, ORIGIN)).toBe('/');
  });

  it('falls back to / without a target', () => {
    expect(safeRedirect(null, ORIGIN)).toBe('/');
    expect(safeRedirect(undefined, ORIGIN)).toBe('/');
  });

  const ours: [string, string][] = [
    ['/', '/'],
    ['/formulations', '/formulations'],
    ['/formulations/12/revisions/3?tab=signatures', '/formulations/12/revisions/3?tab=signatures'],
    ['/library?q=YAG#top', '/library?q=YAG#top'],
    ['/designer/../library', '/library']
  ];
  it.each(ours)('keeps the site path %j', (target, expected) => {
    expect(safeRedirect(target, ORIGIN)).toBe(expected);
  });

  it('never returns anything a browser resolves to another origin', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 40 }), (tail) => {
        const out = safeRedirect('/' + tail, ORIGIN);
        expect(new URL(out, ORIGIN).origin).toBe(ORIGIN);
        expect(out.startsWith('/')).toBe(true);
        expect(out[1] === '/' || out[1] === '\\').toBe(false);
      }),
      { numRuns: 2000 }
    );
  });
});
