/**
 * The one check of an e-signature password (re-authentication at signing, model: 21 CFR 11.200(a)).
 * Failures count with sign-in failures (./throttle.ts): five within 15 minutes lock signing and
 * sign-in for the account; the lock is audited as `signature_locked` and refused with a sentence
 * saying when to retry. As with sign-in, a success clears earlier failures; a locked account is
 * refused even the right password, so a lock cannot be lifted by guessing.
 */
import { record } from '../db/audit';
import * as users from '../accounts/users';
import { forbidden } from '../../errors/domain-error';
import { verifyPassword, DUMMY_HASH } from './passwords';
import { lockedUntil, recordAttempt, retryTime } from './throttle';

export interface Signer {
  id: number;
  email: string;
}

/** Where the signature was asked for, for the audit row. */
export interface SigningSubject {
  entityType: string;
  entityId: number;
}

function lockRefusal(until: Date) {
  return forbidden(
    `Signing is locked for this account after too many wrong passwords: nothing was signed. Try again after ${retryTime(until)}.`,
    [{ path: 'password', message: 'password: signing is locked' }]
  );
}

async function auditLock(signer: Signer, subject: SigningSubject, until: Date, reason: string): Promise<void> {
  await record({
    actorId: signer.id,
    actorEmail: signer.email,
    entityType: subject.entityType,
    entityId: subject.entityId,
    action: 'signature_locked',
    after: { reason, lockedUntil: until.toISOString() }
  });
}

/**
 * True when the password is the signer's own and the account is active; false when it is wrong
 * (the failure is counted). Throws a refusal when signing is locked, before or because of this try.
 */
export async function checkSigningPassword(signer: Signer, password: string, subject: SigningSubject): Promise<boolean> {
  const before = await lockedUntil(signer.email);
  if (before) {
    await auditLock(signer, subject, before, 'signing attempted while locked');
    throw lockRefusal(before);
  }
  const account = await users.findWithHashByEmail(signer.email);
  const ok = await verifyPassword(password, account?.passwordHash || DUMMY_HASH);
  if (ok && account && account.id === signer.id && account.active) {
    await recordAttempt(signer.email, true, null);
    return true;
  }
  await recordAttempt(signer.email, false, null);
  const after = await lockedUntil(signer.email);
  if (after) {
    await auditLock(signer, subject, after, 'too many wrong signature passwords');
    throw lockRefusal(after);
  }
  return false;
}
