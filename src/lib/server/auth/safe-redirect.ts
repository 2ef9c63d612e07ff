/**
 * Where to send a user after sign-in: a path on this site, or `/`.
 * Browsers read `\` as `/` and drop tab/newline inside URLs (WHATWG URL Standard, "special" schemes),
 * so `/\evil.example` and `/\t/evil.example` both mean `//evil.example`, another host.
 */
export function safeRedirect(target: string | null | undefined, origin: string): string {
  if (!target || target.length > 2000) return '/';
  if (!target.startsWith('/') || target[1] === '/' || target[1] === '\\') return '/';
  // Backslashes and control characters have no place in our own paths; they only serve to hide a host.
  if ([...target].some((ch) => ch === '\\' || ch.charCodeAt(0) < 0x20 || ch.charCodeAt(0) === 0x7f)) return '/';
  let base: URL;
  let url: URL;
  try {
    base = new URL(origin);
    url = new URL(target, base);
  } catch {
    return '/';
  }
  if (url.origin !== base.origin) return '/';
  const path = url.pathname + url.search + url.hash;
  // Dot segments can collapse into `//host` (`/.//evil.example`): check the parsed path again.
  if (!path.startsWith('/') || path[1] === '/' || path[1] === '\\') return '/';
  return path;
}
