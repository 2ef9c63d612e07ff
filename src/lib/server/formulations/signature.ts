/**
 * Re-authentication for an e-signature: the signer re-enters their password at the moment of
 * signing (model: 21 CFR 11.200(a)). A refusal is written to the audit trail.
 */
import { verifyPassword, DUMMY_HASH } from '../auth/passwords';
import { record } from '../db/audit';
import * as users from '../accounts/users';
import { SignatureError } from './errors';
import type { Caller } from './guard';

export async function verifySignaturePassword(caller: Caller, revisionId: number, meaning: string, password: string): Promise<void> {
  const account = await users.findWithHashByEmail(caller.email);
  const ok = await verifyPassword(password, account?.passwordHash || DUMMY_HASH);
  if (ok && account && account.id === caller.id && account.active) return;
  await record({
    actorId: caller.id,
    actorEmail: caller.email,
    entityType: 'formulation_revision',
    entityId: revisionId,
    action: 'e-signature-refused',
    after: { meaning, reason: 'password did not match' }
  });
  throw new SignatureError('The password is not correct, so nothing was signed. Re-enter your own password to sign.');
}
