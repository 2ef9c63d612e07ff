/**
 * Re-authentication for an e-signature: the signer re-enters their password at the moment of
 * signing (model: 21 CFR 11.200(a)); wrong passwords are throttled (../auth/signing-password.ts). A refusal is written to the audit trail.
 */
import { checkSigningPassword } from '../auth/signing-password';
import { record } from '../db/audit';
import { SignatureError } from './errors';
import type { Caller } from './guard';

export async function verifySignaturePassword(caller: Caller, revisionId: number, meaning: string, password: string): Promise<void> {
  if (await checkSigningPassword(caller, password, { entityType: 'formulation_revision', entityId: revisionId })) return;
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
