/** One-time invitation links (token stored as a hash). */
import { randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { db } from '../db/index';
import { sha256Hex } from '../auth/tokens';
import { isRole, type Role } from '../../roles';

export const INVITE_HOURS = 72;

export interface Invite {
  id: number;
  email: string;
  roles: Role[];
  expiresAt: Date;
  usedAt: Date | null;
}

/** Writes an invitation (in the caller's transaction when given); returns its id and the one-time token. */
export async function create(
  email: string,
  roles: Role[],
  invitedBy: number,
  trx?: Knex.Transaction
): Promise<{ id: number; token: string; expiresAt: Date }> {
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + INVITE_HOURS * 3_600_000);
  const [id] = await (trx ?? db())('invites').insert({
    email: email.toLowerCase(),
    roles: roles.join(','),
    token_hash: sha256Hex(token),
    invited_by: invitedBy,
    expires_at: expiresAt
  });
  return { id, token, expiresAt };
}

/** The invite for a token if it is unused and not expired. */
export async function findOpen(token: string): Promise<Invite | null> {
  if (token.length > 100) return null;
  const row = await db()('invites')
    .where({ token_hash: sha256Hex(token) })
    .whereNull('used_at')
    .andWhere('expires_at', '>', db().fn.now())
    .first();
  if (!row) return null;
  return {
    id: row.id,
    email: row.email,
    roles: String(row.roles).split(',').filter(isRole),
    expiresAt: row.expires_at,
    usedAt: row.used_at
  };
}

export async function listOpen(): Promise<Invite[]> {
  const rows = await db()('invites').whereNull('used_at').andWhere('expires_at', '>', db().fn.now()).orderBy('created_at', 'desc');
  return rows.map((row) => ({
    id: row.id,
    email: row.email,
    roles: String(row.roles).split(',').filter(isRole),
    expiresAt: row.expires_at,
    usedAt: null
  }));
}
