/** Personal API tokens: random, shown once, stored as a SHA-256 hash, revocable, expiring. */
import { createHash, randomBytes } from 'node:crypto';
import { db } from '../db/index';
import * as users from '../db/users';
import type { User } from '../db/users';

export const TOKEN_PREFIX = 'pfk_';

export function sha256Hex(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}

export function newSecret(): string {
  return TOKEN_PREFIX + randomBytes(30).toString('base64url');
}

export interface TokenInfo { id: number; name: string; prefix: string; expiresAt: Date; revokedAt: Date | null; lastUsedAt: Date | null; createdAt: Date }

export async function create(userId: number, name: string, days: number): Promise<{ id: number; token: string }> {
  const token = newSecret();
  const [id] = await db()('api_tokens').insert({
    user_id: userId, name, token_hash: sha256Hex(token), prefix: token.slice(0, 10),
    expires_at: new Date(Date.now() + days * 86_400_000)
  });
  return { id, token };
}

export async function listFor(userId: number): Promise<TokenInfo[]> {
  const rows = await db()('api_tokens').where({ user_id: userId }).orderBy('created_at', 'desc');
  return rows.map((r) => ({ id: r.id, name: r.name, prefix: r.prefix, expiresAt: r.expires_at, revokedAt: r.revoked_at, lastUsedAt: r.last_used_at, createdAt: r.created_at }));
}

export async function revoke(userId: number, id: number): Promise<boolean> {
  const n = await db()('api_tokens').where({ id, user_id: userId }).whereNull('revoked_at').update({ revoked_at: db().fn.now() });
  return n > 0;
}

/** The active user a bearer token belongs to, or null (unknown, expired, revoked, or user deactivated). */
export async function userForToken(token: string): Promise<User | null> {
  if (!token.startsWith(TOKEN_PREFIX) || token.length > 100) return null;
  const row = await db()('api_tokens').where({ token_hash: sha256Hex(token) }).whereNull('revoked_at')
    .andWhere('expires_at', '>', db().fn.now()).first('id', 'user_id');
  if (!row) return null;
  const user = await users.get(row.user_id);
  if (!user || !user.active) return null;
  // Last use is kept to the minute: no write per request, so busy tokens do not contend on one row.
  await db()('api_tokens').where({ id: row.id })
    .andWhere((q) => q.whereNull('last_used_at').orWhere('last_used_at', '<', db().raw('NOW() - INTERVAL 1 MINUTE')))
    .update({ last_used_at: db().fn.now() });
  return user;
}
