/** Issuing and revoking a personal API token, each in one transaction with its audit row. */
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import * as tokens from './tokens';
import type { User } from '../accounts/users';

export async function issueToken(user: User, name: string, days: number): Promise<{ id: number; token: string }> {
  return writeTransaction(async (trx) => {
    const created = await tokens.create(user.id, name, days, trx);
    const event = {
      actorId: user.id,
      actorEmail: user.email,
      entityType: 'api_token',
      entityId: created.id,
      action: 'create',
      after: { name, days }
    };
    await record(event, trx);
    return created;
  });
}

/** False when the user has no such active token (nothing is recorded then). */
export async function revokeToken(user: User, id: number): Promise<boolean> {
  return writeTransaction(async (trx) => {
    if (!(await tokens.revoke(user.id, id, trx))) return false;
    await record({ actorId: user.id, actorEmail: user.email, entityType: 'api_token', entityId: id, action: 'revoke' }, trx);
    return true;
  });
}
