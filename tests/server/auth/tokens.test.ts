import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as tokens from '../../../src/lib/server/auth/tokens';
import * as users from '../../../src/lib/server/accounts/users';

let userId = 0;
const email = 'token.probe@kestrelhollow.example';

describe('personal API tokens', () => {
  beforeAll(async () => {
    await db()('users').where({ email }).delete();
    userId = await users.create({ email, name: 'Token Probe', passwordHash: 'x', roles: ['quality'] });
  });
  afterAll(async () => {
    await db()('users').where({ id: userId }).delete();
    await closeDb();
  });

  it("stores only a hash and resolves the token to its user with that user's roles", async () => {
    const { id, token } = await tokens.create(userId, 'probe', 30);
    const row = (await db()('api_tokens').where({ id }).first())!;
    expect(row.token_hash).toBe(tokens.sha256Hex(token));
    expect(JSON.stringify(row)).not.toContain(token);
    const user = await tokens.userForToken(token);
    expect(user?.id).toBe(userId);
    expect(user?.roles).toEqual(['quality']);
  });

  it('refuses revoked, expired and unknown tokens', async () => {
    const a = await tokens.create(userId, 'to revoke', 30);
    expect(await tokens.revoke(userId, a.id)).toBe(true);
    expect(await tokens.userForToken(a.token)).toBeNull();
    const b = await tokens.create(userId, 'to expire', 30);
    await db()('api_tokens')
      .where({ id: b.id })
      .update({ expires_at: new Date(Date.now() - 1000) });
    expect(await tokens.userForToken(b.token)).toBeNull();
    expect(await tokens.userForToken('pfk_unknown')).toBeNull();
    expect(await tokens.userForToken('no-prefix')).toBeNull();
  });

  it('stops working when its user is deactivated', async () => {
    const c = await tokens.create(userId, 'deactivation', 30);
    expect(await tokens.userForToken(c.token)).not.toBeNull();
    await users.setActive(userId, false);
    expect(await tokens.userForToken(c.token)).toBeNull();
    await users.setActive(userId, true);
  });

  it('cannot be revoked by another user', async () => {
    const d = await tokens.create(userId, 'someone else', 30);
    expect(await tokens.revoke(userId + 100000, d.id)).toBe(false);
  });

  it('shares one lookup between simultaneous requests with the same token, each getting its own user object', async () => {
    const e = await tokens.create(userId, 'busy client', 30);
    await tokens.userForToken(e.token); // sets last use, so the calls below only read
    let lookups = 0;
    const count = (q: { sql: string }) => {
      if (/from `api_tokens`/i.test(q.sql) && /^select/i.test(q.sql)) lookups++;
    };
    db().on('query', count);
    try {
      const all = await Promise.all(Array.from({ length: 20 }, () => tokens.userForToken(e.token)));
      expect(all.every((u) => u?.id === userId)).toBe(true);
      expect(new Set(all).size).toBe(20);
      expect(lookups).toBe(1);
      // A request after the shared lookup has settled reads again and sees a revocation at once.
      await tokens.revoke(userId, e.id);
      expect(await tokens.userForToken(e.token)).toBeNull();
      expect(lookups).toBe(2);
    } finally {
      db().off('query', count);
    }
  });

  it('does not share a lookup that started longer ago than the window', async () => {
    const f = await tokens.create(userId, 'slow lookup', 30);
    await tokens.userForToken(f.token);
    let lookups = 0;
    const count = (q: { sql: string }) => {
      if (/from `api_tokens`/i.test(q.sql) && /^select/i.test(q.sql)) lookups++;
    };
    db().on('query', count);
    const realNow = Date.now;
    try {
      const first = tokens.userForToken(f.token);
      // The next request arrives (by the clock) just after the window has passed: it starts its own lookup.
      const start = realNow();
      Date.now = () => start + tokens.SHARE_WINDOW_MS + 1;
      const second = tokens.userForToken(f.token);
      Date.now = realNow;
      expect((await first)?.id).toBe(userId);
      expect((await second)?.id).toBe(userId);
      expect(lookups).toBe(2);
    } finally {
      Date.now = realNow;
      db().off('query', count);
    }
  });
});
