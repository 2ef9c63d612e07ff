/**
 * The password check of sign-in: refuses a blocked client address, then a locked account
 * (./throttle.ts), then a wrong password, an unknown or a deactivated account; every outcome is
 * recorded and audited. A blocked address is refused without counting against the account, so one
 * client cannot lock account after account.
 */
import * as users from '../accounts/users';
import * as audit from '../db/audit';
import { verifyPassword, DUMMY_HASH } from './passwords';
import { isAddressBlocked, isThrottled, recordAttempt } from './throttle';

export interface SignedIn {
  id: number;
  email: string;
  name: string;
}

/** The account when the password is right and nothing blocks it; null otherwise. */
export async function checkSignIn(email: string, password: string, ip: string | null): Promise<SignedIn | null> {
  if (await isAddressBlocked(ip)) {
    await audit.record({ actorEmail: email, entityType: 'session', action: 'sign-in-address-blocked', ip });
    return null;
  }
  if (await isThrottled(email)) {
    await recordAttempt(email, false, ip);
    await audit.record({ actorEmail: email, entityType: 'session', action: 'sign-in-throttled', ip });
    return null;
  }
  const user = await users.findWithHashByEmail(email);
  const ok = await verifyPassword(password, user?.passwordHash || DUMMY_HASH);
  if (!user || !ok || !user.active) {
    await recordAttempt(email, false, ip);
    await audit.record({ actorId: user?.id ?? null, actorEmail: email, entityType: 'session', action: 'sign-in-failed', ip });
    return null;
  }
  await recordAttempt(email, true, ip);
  await audit.record({ actorId: user.id, actorEmail: user.email, entityType: 'session', action: 'sign-in', ip });
  return { id: user.id, email: user.email, name: user.name };
}
