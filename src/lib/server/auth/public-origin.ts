/**
 * The origin Auth.js builds its own URLs from (callback, redirect base, cookie prefix).
 * Auth.js reads `X-Forwarded-Host`/`X-Forwarded-Proto` (then `Host`) from the request, which any
 * client can set; unless a proxy is declared trusted, they are replaced by the app's own origin
 * (ORIGIN, as adapter-node applies it to the request URL).
 */
export function authForwardedHeaders(appUrl: URL, headers: Headers, trustProxyHost: boolean): { host: string; proto: string } {
  if (trustProxyHost) {
    const host = headers.get('x-forwarded-host') ?? headers.get('host') ?? appUrl.host;
    const proto = headers.get('x-forwarded-proto') ?? appUrl.protocol;
    return { host, proto: proto.replace(/:$/, '') };
  }
  return { host: appUrl.host, proto: appUrl.protocol.replace(/:$/, '') };
}

/**
 * Session cookies carry `Secure` (and the `__Secure-` prefix) exactly when the public origin is
 * https. NODE_ENV alone does not decide it: a production build served on http://127.0.0.1 must
 * still be able to keep its session, and a browser drops Secure cookies on plain http.
 */
export function useSecureCookies(publicProtocol: string): boolean {
  return publicProtocol.replace(/:$/, '') === 'https';
}
