import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/accounts/users';
import { hashPassword } from '../../../src/lib/server/auth/passwords';
import { checkSigningPassword } from '../../../src/lib/server/auth/signing-password';
import { checkSignIn } from '../../../src/lib/server/auth/sign-in';
import { isThrottled } from '../../../src/lib/server/auth/throttle';
import { DomainError } from '../../../src/lib/errors/domain-error';

// Requirement of the product: e-signature passwords follow the sign-in throttle (5 failures per account per
// 15 minutes, counted in the database); the lock covers signing and sign-in and is audited as signature_locked.
const email = `signer.${Date.now()}@kestrelhollow.example`;
const PASSWORD = 'right-password-for-signing';
let signer: { id: number; email: string };
const subject = { entityType: 'formulation_revision', entityId: 999_001 };

describe('e-signature password throttling', () => {
  beforeAll(async () => {
    const id = await users.create({ email, name: 'Test Signer', passwordHash: await hashPassword(PASSWORD), roles: ['quality'] });
    signer = { id, email };
  });
  afterAll(async () => {
    await db()('sign_in_attempts').where({ email }).delete();
    await closeDb();
  });

  it('accepts the right password and refuses a wrong one without locking', async () => {
    expect(await checkSigningPassword(signer, PASSWORD, subject)).toBe(true);
    expect(await checkSigningPassword(signer, 'wrong-1', subject)).toBe(false);
  });

  it('locks signing and sign-in on the 5th wrong password, refuses the right one with a retry time, audits it', async () => {
    for (let i = 2; i <= 4; i++) expect(await checkSigningPassword(signer, `wrong-${i}`, subject)).toBe(false);
    const fifth = await checkSigningPassword(signer, 'wrong-5', subject).catch((e: unknown) => e);
    expect(fifth).toBeInstanceOf(DomainError);
    expect((fifth as DomainError).status).toBe(403);
    expect((fifth as Error).message).toMatch(/locked .*Try again after \d\d:\d\d UTC/);

    const right = await checkSigningPassword(signer, PASSWORD, subject).catch((e: unknown) => e);
    expect((right as Error).message).toMatch(/Signing is locked/);
    expect(await isThrottled(email)).toBe(true);
    expect(await checkSignIn(email, PASSWORD, '192.0.2.10')).toBeNull();

    const audit = await db()('audit_events').where({ actor_id: signer.id, action: 'signature_locked' }).select('entity_id');
    expect(audit.length).toBeGreaterThanOrEqual(2);
    expect(audit[0].entity_id).toBe('999001');
  });

  it('ends the lock once the failures are older than 15 minutes', async () => {
    const old = new Date(Date.now() - 16 * 60_000);
    await db()('sign_in_attempts').where({ email }).update({ created_at: old });
    expect(await checkSigningPassword(signer, PASSWORD, subject)).toBe(true);
    expect(await checkSignIn(email, PASSWORD, '192.0.2.10')).toMatchObject({ id: signer.id });
  });
});
