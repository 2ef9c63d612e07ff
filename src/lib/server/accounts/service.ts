/** Account administration: invitations, acceptance, roles, deactivation — each audited. */
import { writeTransaction } from '../db/transaction';
import * as users from './users';
import * as invites from './invites';
import * as audit from '../db/audit';
import { hashPassword } from '../auth/passwords';
import { endSessions } from '../auth/session-epoch';
import { revokeAllTokens } from '../auth/tokens';
import { sha256Hex } from '../auth/tokens';
import { send } from '../mail/index';
import { inviteMessage } from '../mail/templates/invite';
import type { Role } from '../../roles';
import type { User } from './users';
import { DomainError } from '../../errors/domain-error';

/** A refused account change (taken email, used invitation, removing one's own admin role): kind `conflict`. */
export class AccountError extends DomainError {
  constructor(message: string) {
    super('conflict', message);
  }
}

/**
 * Invites someone: the invitation and its audit event are written in one transaction (the event
 * names the invitation by id; the address, up to 254 characters, goes into its details), and the
 * mail is sent only after the commit, so a failure leaves neither a half-made invitation nor a link.
 */
export async function invite(admin: User, email: string, roles: Role[], origin: string): Promise<{ link: string; mailed: boolean }> {
  const existing = await users.findWithHashByEmail(email);
  if (existing) throw new AccountError(`${email} already has an account.`);
  const { token, expiresAt } = await writeTransaction(async (trx) => {
    const made = await invites.create(email, roles, admin.id, trx);
    await audit.record(
      { actorId: admin.id, actorEmail: admin.email, entityType: 'invite', entityId: made.id, action: 'invite', after: { email, roles } },
      trx
    );
    return made;
  });
  const link = `${origin}/invite/${token}`;
  const mailed = await send(inviteMessage(email, admin.name, link, expiresAt, roles));
  return { link, mailed };
}

export async function acceptInvite(token: string, name: string, password: string): Promise<number> {
  const open = await invites.findOpen(token);
  if (!open) throw new AccountError('This invitation link is invalid, already used or expired.');
  const passwordHash = await hashPassword(password);
  return writeTransaction(async (trx) => {
    const claimed = await trx('invites')
      .where({ token_hash: sha256Hex(token) })
      .whereNull('used_at')
      .update({ used_at: trx.fn.now() });
    if (claimed !== 1) throw new AccountError('This invitation link is invalid, already used or expired.');
    if (await trx('users').where({ email: open.email }).first('id')) throw new AccountError(`${open.email} already has an account.`);
    const [id] = await trx('users').insert({ email: open.email, name, password_hash: passwordHash });
    if (open.roles.length) await trx('user_roles').insert(open.roles.map((role) => ({ user_id: id, role })));
    await audit.record(
      { actorId: id, actorEmail: open.email, entityType: 'user', entityId: id, action: 'invite-accepted', after: { roles: open.roles } },
      trx
    );
    return id;
  });
}

export async function changeRoles(admin: User, userId: number, roles: Role[]): Promise<void> {
  const before = await users.get(userId);
  if (!before) throw new AccountError('No such user.');
  if (userId === admin.id && !roles.includes('admin')) throw new AccountError('You cannot remove your own admin role.');
  await users.setRoles(userId, roles);
  // Sessions signed in under the old roles end; the user signs in again with the new ones.
  await endSessions(userId);
  await audit.record({
    actorId: admin.id,
    actorEmail: admin.email,
    entityType: 'user',
    entityId: userId,
    action: 'roles-changed',
    before: { roles: before.roles },
    after: { roles }
  });
}

export async function setActive(admin: User, userId: number, active: boolean): Promise<void> {
  const before = await users.get(userId);
  if (!before) throw new AccountError('No such user.');
  if (userId === admin.id && !active) throw new AccountError('You cannot deactivate yourself.');
  await users.setActive(userId, active);
  // Deactivation ends every session and revokes every API token; reactivating brings neither back.
  if (!active) {
    await endSessions(userId);
    await revokeAllTokens(userId);
  }
  await audit.record({
    actorId: admin.id,
    actorEmail: admin.email,
    entityType: 'user',
    entityId: userId,
    action: active ? 'reactivated' : 'deactivated',
    before: { active: before.active },
    after: { active }
  });
}
