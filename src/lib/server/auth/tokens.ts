/** Personal API tokens: random, shown once, stored as a SHA-256 hash, revocable, expiring. */
import { createHash, randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { db } from '../db/index';
import { isRole } from '../../roles';
import type { User } from '../accounts/users';

export const TOKEN_PREFIX = 'pfk_';

export function sha256Hex(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}

export function newSecret(): string {
  return TOKEN_PREFIX + randomBytes(30).toString('base64url');
}

export interface TokenInfo {
  id: number;
  name: string;
  prefix: string;
  expiresAt: Date;
  revokedAt: Date | null;
  lastUsedAt: Date | null;
  createdAt: Date;
}

export async function create(
  userId: number,
  name: string,
  days: number,
  k: Knex | Knex.Transaction = db()
): Promise<{ id: number; token: string }> {
  const token = newSecret();
  const [id] = await k('api_tokens').insert({
    user_id: userId,
    name,
    token_hash: sha256Hex(token),
    prefix: token.slice(0, 10),
    expires_at: new Date(Date.now() + days * 86_400_000)
  });
  return { id, token };
}

export async function listFor(userId: number): Promise<TokenInfo[]> {
  const rows = await db()('api_tokens').where({ user_id: userId }).orderBy('created_at', 'desc');
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    prefix: r.prefix,
    expiresAt: r.expires_at,
    revokedAt: r.revoked_at,
    lastUsedAt: r.last_used_at,
    createdAt: r.created_at
  }));
}

export async function revoke(userId: number, id: number, k: Knex | Knex.Transaction = db()): Promise<boolean> {
  const n = await k('api_tokens').where({ id, user_id: userId }).whereNull('revoked_at').update({ revoked_at: k.fn.now() });
  return n > 0;
}

interface TokenRow {
  token_id: number;
  last_used_at: Date | null;
  id: number;
  email: string;
  name: string;
  active: number | boolean;
  created_at: Date;
  roles: string | null;
}

/** A request shares a lookup only if that lookup started at most this long before it. */
export const SHARE_WINDOW_MS = 100;

/** Lookups in flight, by token hash: requests that arrive while one is running share its answer. */
const inFlight = new Map<string, { startedAt: number; row: Promise<TokenRow | undefined> }>();

function lookUp(hash: string): Promise<TokenRow | undefined> {
  const now = Date.now();
  const running = inFlight.get(hash);
  if (running && now - running.startedAt <= SHARE_WINDOW_MS) return running.row;
  // One round trip: the live token, its user and the roles.
  const entry = {
    startedAt: now,
    row: db()('api_tokens as t')
      .join('users as u', 'u.id', 't.user_id')
      .leftJoin('user_roles as r', 'r.user_id', 'u.id')
      .where('t.token_hash', hash)
      .whereNull('t.revoked_at')
      .andWhere('t.expires_at', '>', db().fn.now())
      .groupBy('t.id')
      .first(
        't.id as token_id',
        't.last_used_at',
        'u.id',
        'u.email',
        'u.name',
        'u.active',
        'u.created_at',
        db().raw('GROUP_CONCAT(r.role ORDER BY r.role) AS roles')
      )
      .finally(() => {
        if (inFlight.get(hash) === entry) inFlight.delete(hash);
      }) as Promise<TokenRow | undefined>
  };
  inFlight.set(hash, entry);
  return entry.row;
}

/**
 * The active user a bearer token belongs to, or null (unknown, expired, revoked, or user deactivated).
 * There is no cache, so a revocation or deactivation counts on every instance from the next lookup. A
 * request that arrives while the same token's lookup is running, started at most SHARE_WINDOW_MS
 * before, shares its answer: a busy client costs one query per round trip instead of one per request.
 */
export async function userForToken(token: string): Promise<User | null> {
  if (!token.startsWith(TOKEN_PREFIX) || token.length > 100) return null;
  const row = await lookUp(sha256Hex(token));
  if (!row || !row.active) return null;
  // Last use is kept to the minute: no write per request, so busy tokens do not contend on one row.
  if (!row.last_used_at || Date.now() - new Date(row.last_used_at).getTime() > 60_000) {
    row.last_used_at = new Date();
    await db()('api_tokens').where({ id: row.token_id }).update({ last_used_at: db().fn.now() });
  }
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    active: true,
    roles: String(row.roles ?? '')
      .split(',')
      .filter(isRole),
    createdAt: row.created_at
  };
}

/** Revokes every live API token of a user (on deactivation: reactivation does not bring them back). */
export async function revokeAllTokens(userId: number): Promise<number> {
  return db()('api_tokens').where({ user_id: userId }).whereNull('revoked_at').update({ revoked_at: db().fn.now() });
}
