import { afterAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import { checkSignIn } from '../../../src/lib/server/auth/sign-in';
import { isAddressBlocked, isLoopback, isThrottled, MAX_ACCOUNTS_PER_ADDRESS, MAX_FAILURES } from '../../../src/lib/server/auth/throttle';

// Requirement of the product: one client address cannot lock many accounts. Failures from one address against
// MAX_ACCOUNTS_PER_ADDRESS distinct accounts within 15 minutes block the address; the accounts behind stay open.
// 192.0.2.0/24 is the documentation range (RFC 5737).
const ip = `192.0.2.${Date.now() % 250}`;
const victims = Array.from({ length: 6 }, (_, i) => `victim${i}.${Date.now()}@kestrelhollow.example`);

describe('sign-in: per-address blocking', () => {
  afterAll(async () => {
    await db()('sign_in_attempts').whereIn('email', victims).delete();
    await db()('sign_in_attempts').where({ ip }).delete();
    await closeDb();
  });

  it('blocks the address after failures on 3 accounts and locks no further account', async () => {
    expect(MAX_ACCOUNTS_PER_ADDRESS).toBe(3);
    for (const victim of victims) {
      for (let i = 0; i < MAX_FAILURES; i++) expect(await checkSignIn(victim, 'guess', ip)).toBeNull();
    }
    expect(await isAddressBlocked(ip)).toBe(true);
    const locked = [];
    for (const victim of victims) if (await isThrottled(victim)) locked.push(victim);
    // Two accounts reach the lock; the third gets one failure, then the address is blocked.
    expect(locked).toEqual(victims.slice(0, 2));
    const blocked = await db()('audit_events').where({ ip, action: 'sign-in-address-blocked' }).count<{ n: number }[]>('id as n');
    expect(Number(blocked[0].n)).toBeGreaterThan(0);
  });

  it('does not block another address', async () => {
    expect(await isAddressBlocked('198.51.100.7')).toBe(false);
  });
});

// RFC 1122 §3.2.1.3 (127.0.0.0/8) and RFC 4291 §2.5.3 (::1): a local proxy's address is never blocked.
describe('sign-in: loopback addresses are not blocked', () => {
  it.each(['127.0.0.1', '127.8.9.10', '::1', '::ffff:127.0.0.1'])('%s', (address) => {
    expect(isLoopback(address)).toBe(true);
  });
  it.each(['192.0.2.1', '::ffff:192.0.2.1', '2001:db8::1'])('%s is counted', (address) => {
    expect(isLoopback(address)).toBe(false);
  });
});
