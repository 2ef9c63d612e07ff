/**
 * The welcome after an accepted invitation: the new user's name and e-mail travel to the sign-in
 * page in a short-lived, http-only cookie (never in the address, which lands in logs and history),
 * read once and deleted.
 */
import type { Cookies } from '@sveltejs/kit';
import { z } from 'zod';
import { useSecureCookies } from '../auth/public-origin';

const COOKIE = 'pf_welcome';
const welcomeSchema = z.object({ name: z.string().max(200), email: z.string().max(254) });
export type Welcome = z.infer<typeof welcomeSchema>;

export function setWelcome(cookies: Cookies, url: URL, welcome: Welcome): void {
  cookies.set(COOKIE, JSON.stringify(welcome), {
    path: '/signin',
    httpOnly: true,
    sameSite: 'lax',
    secure: useSecureCookies(url.protocol),
    maxAge: 10 * 60
  });
}

/** The welcome, once: the cookie is deleted as it is read. Null when there is none or it is not ours. */
export function takeWelcome(cookies: Cookies): Welcome | null {
  const raw = cookies.get(COOKIE);
  if (raw === undefined) return null;
  cookies.delete(COOKIE, { path: '/signin' });
  try {
    const parsed = welcomeSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
