import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import { isThrottled, recordAttempt, MAX_FAILURES } from '../../../src/lib/server/auth/throttle';

// Requirement of the product (issue "Foundation"): 5 failures per account per 15 minutes, counted in the database.
const email = 'throttle.probe@kestrelhollow.example';

describe('sign-in throttling (database-backed)', () => {
  beforeEach(async () => {
    await db()('sign_in_attempts').where({ email }).delete();
  });
  afterAll(async () => {
    await db()('sign_in_attempts').where({ email }).delete();
    await closeDb();
  });

  it('allows 4 failures and locks on the 5th', async () => {
    for (let i = 0; i < 4; i++) await recordAttempt(email, false, '127.0.0.1');
    expect(await isThrottled(email)).toBe(false);
    await recordAttempt(email, false, '127.0.0.1');
    expect(MAX_FAILURES).toBe(5);
    expect(await isThrottled(email)).toBe(true);
  });

  it('counts only the last 15 minutes', async () => {
    const old = new Date(Date.now() - 16 * 60_000);
    await db()('sign_in_attempts').insert(Array.from({ length: 6 }, () => ({ email, succeeded: false, created_at: old })));
    expect(await isThrottled(email)).toBe(false);
  });

  it('forgets failures before a successful sign-in', async () => {
    const earlier = new Date(Date.now() - 60_000);
    await db()('sign_in_attempts').insert(Array.from({ length: 5 }, () => ({ email, succeeded: false, created_at: earlier })));
    await recordAttempt(email, true, null);
    expect(await isThrottled(email)).toBe(false);
  });

  it('is case-insensitive in the e-mail', async () => {
    for (let i = 0; i < 5; i++) await recordAttempt(email.toUpperCase(), false, null);
    expect(await isThrottled(email)).toBe(true);
  });
});
