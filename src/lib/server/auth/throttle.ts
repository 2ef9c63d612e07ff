/**
 * Sign-in throttling: 5 failed attempts per account within 15 minutes lock further attempts
 * (counted in the database, so every app instance agrees). Failures before the latest success
 * do not count.
 */
import { db } from '../db/index';

export const MAX_FAILURES = 5;
export const WINDOW_MINUTES = 15;

export async function isThrottled(email: string): Promise<boolean> {
  const key = email.toLowerCase();
  const lastSuccess = await db()('sign_in_attempts')
    .where({ email: key, succeeded: 1 })
    .max<{ at: Date | null }[]>('created_at as at')
    .first();
  const q = db()('sign_in_attempts')
    .where({ email: key, succeeded: 0 })
    .andWhere('created_at', '>', db().raw(`NOW(3) - INTERVAL ${WINDOW_MINUTES} MINUTE`));
  if (lastSuccess?.at) q.andWhere('created_at', '>', lastSuccess.at);
  const row = await q.count<{ n: number }[]>('id as n').first();
  return Number(row?.n ?? 0) >= MAX_FAILURES;
}

export async function recordAttempt(email: string, succeeded: boolean, ip: string | null): Promise<void> {
  await db()('sign_in_attempts').insert({ email: email.toLowerCase().slice(0, 254), succeeded, ip });
}
