/**
 * Password throttling, counted in the database so that every app instance agrees.
 * Per account: 5 failed passwords (sign-in or e-signature) within 15 minutes lock both sign-in and
 * signing for that account until the oldest of those failures is 15 minutes old. Failures before
 * the latest success do not count.
 * Per client address: failures from one address against 3 or more distinct accounts within the
 * window block that address, so that one client cannot lock account after account. Loopback
 * addresses are not blocked: behind a local reverse proxy without ADDRESS_HEADER every client would
 * share that one address, and blocking it would shut everyone out.
 */
import { db } from '../db/index';

export const MAX_FAILURES = 5;
export const WINDOW_MINUTES = 15;
export const MAX_ACCOUNTS_PER_ADDRESS = 3;

const windowStart = () => db().raw(`NOW(3) - INTERVAL ${WINDOW_MINUTES} MINUTE`);
const plusWindow = (at: Date) => new Date(at.getTime() + WINDOW_MINUTES * 60_000);

/** The moment the account's lock ends, or null when it is not locked. */
export async function lockedUntil(email: string): Promise<Date | null> {
  const key = email.toLowerCase();
  const lastSuccess = await db()('sign_in_attempts')
    .where({ email: key, succeeded: 1 })
    .max<{ at: Date | null }[]>('created_at as at')
    .first();
  const q = db()('sign_in_attempts').where({ email: key, succeeded: 0 }).andWhere('created_at', '>', windowStart());
  if (lastSuccess?.at) q.andWhere('created_at', '>', lastSuccess.at);
  const rows = await q.orderBy('created_at', 'desc').limit(MAX_FAILURES).select<{ created_at: Date }[]>('created_at');
  if (rows.length < MAX_FAILURES) return null;
  return plusWindow(new Date(rows[MAX_FAILURES - 1].created_at));
}

export async function isThrottled(email: string): Promise<boolean> {
  return (await lockedUntil(email)) !== null;
}

/** True when failures from this address reached MAX_ACCOUNTS_PER_ADDRESS distinct accounts in the window. */
export async function isAddressBlocked(ip: string | null): Promise<boolean> {
  if (!ip || isLoopback(ip)) return false;
  const row = await db()('sign_in_attempts')
    .where({ ip, succeeded: 0 })
    .andWhere('created_at', '>', windowStart())
    .countDistinct<{ n: number }[]>('email as n')
    .first();
  return Number(row?.n ?? 0) >= MAX_ACCOUNTS_PER_ADDRESS;
}

/** 127.0.0.0/8 and ::1, also IPv4-mapped (RFC 1122 §3.2.1.3, RFC 4291 §2.5.3). */
export function isLoopback(ip: string): boolean {
  const v4 = ip.startsWith('::ffff:') ? ip.slice(7) : ip;
  return v4.startsWith('127.') || ip === '::1';
}

export async function recordAttempt(email: string, succeeded: boolean, ip: string | null): Promise<void> {
  await db()('sign_in_attempts').insert({ email: email.toLowerCase().slice(0, 254), succeeded, ip });
}

/** "14:32 UTC": when a lock ends, for messages. */
export function retryTime(at: Date): string {
  return `${at.toISOString().slice(11, 16)} UTC`;
}
