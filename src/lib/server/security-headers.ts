/** Security headers for every response (frame denial, no sniffing, a referrer policy). */
export function securityHeaders(_path: string): Record<string, string> {
  return {
    'x-frame-options': 'DENY',
    'x-content-type-options': 'nosniff',
    'referrer-policy': 'same-origin',
    'permissions-policy': 'camera=(), microphone=(), geolocation=()'
  };
}
