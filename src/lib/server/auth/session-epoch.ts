/**
 * Server-side revocation of signed-in sessions (JWT cookies): a session names the user's session
 * epoch it began in, and only the current epoch is accepted. Ending a user's sessions moves the
 * epoch on (one indexed update); checking costs one primary-key lookup per request.
 */
import type { Knex } from 'knex';
import { db, isDbUnavailable } from '../db/index';
import { record } from '../db/audit';

/** The user's current epoch, or null when the user does not exist. */
export async function sessionEpochOf(userId: number): Promise<number | null> {
  const row = await db()('users').where({ id: userId }).first('session_epoch');
  return row ? Number(row.session_epoch) : null;
}

/**
 * Whether a session from `epoch` is still current. With the database unreachable the answer is
 * "yes for now": the request then fails at the user lookup with a 503 (not a sign-out that would
 * throw the cookie away), and the check runs again once the database is back.
 */
export async function sessionCurrent(userId: number, epoch: number): Promise<boolean> {
  try {
    return (await sessionEpochOf(userId)) === epoch;
  } catch (err) {
    if (isDbUnavailable(err)) return true;
    throw err;
  }
}

/** Ends every signed-in session of the user (API tokens are separate: see tokens.ts). */
export async function endSessions(userId: number, trx?: Knex | Knex.Transaction): Promise<void> {
  const k = trx ?? db();
  await k('users').where({ id: userId }).increment('session_epoch', 1);
}

/** Sign-out: ends every session of the user (a copied cookie too), with its audit event. */
export async function signOutEverywhere(user: { id: number; email: string }): Promise<void> {
  await endSessions(user.id);
  await record({ actorId: user.id, actorEmail: user.email, entityType: 'session', entityId: user.id, action: 'sign-out' });
}
