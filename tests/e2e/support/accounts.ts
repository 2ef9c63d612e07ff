/** Helpers for end-to-end tests: demo sign-ins, throwaway accounts, signed-in API contexts. */
import { request, type APIRequestContext, type Page, expect } from '@playwright/test';
import knexFactory from 'knex';
import bcrypt from 'bcryptjs';
import config from '../../../knexfile';
import type { Role } from '../../../src/lib/roles';

export const BASE = `http://127.0.0.1:${process.env.PORT ?? 4173}`;
export const DEMO_PASSWORD = 'phosforge-demo';
export const DEMO: Record<Role, string> = {
  formulator: 'rhea.okafor@kestrelhollow.example',
  technician: 'tomas.brand@kestrelhollow.example',
  quality: 'ines.halloran@kestrelhollow.example',
  admin: 'admin@kestrelhollow.example'
};

export function testDb() {
  return knexFactory(config.development);
}

/** Creates (or resets) an account directly in the test database and returns its id. */
export async function makeUser(email: string, roles: Role[], password = 'throwaway-password-1'): Promise<number> {
  const knex = testDb();
  try {
    await knex('sign_in_attempts').where({ email }).delete();
    const hash = await bcrypt.hash(password, 4);
    const old = await knex('users').where({ email }).first('id');
    // Audit rows keep their actor, so an existing account is reset rather than deleted.
    let id: number;
    if (old) {
      id = old.id;
      await knex('users').where({ id }).update({ password_hash: hash, active: true, deactivated_at: null });
      await knex('user_roles').where({ user_id: id }).delete();
    } else {
      [id] = await knex('users').insert({ email, name: email.split('@')[0], password_hash: hash });
    }
    await knex('user_roles').insert(roles.map((role) => ({ user_id: id, role })));
    return id;
  } finally {
    await knex.destroy();
  }
}

/** Posts the credentials the way the sign-in form does; returns the final redirect location. */
export async function postSignIn(ctx: APIRequestContext, email: string, password: string, origin = BASE): Promise<string> {
  const res = await ctx.post('/auth/callback/credentials', {
    headers: { Origin: origin },
    form: { email, password, callbackUrl: '/' },
    maxRedirects: 0
  });
  expect(res.status()).toBe(302);
  return res.headers()['location'] ?? '';
}

/** An API context holding a session for this account (demo password unless given). */
export async function signedInContext(email: string, password = DEMO_PASSWORD): Promise<APIRequestContext> {
  const ctx = await request.newContext({ baseURL: BASE });
  const location = await postSignIn(ctx, email, password);
  expect(location).not.toContain('error');
  return ctx;
}

export async function signInThroughForm(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/signin');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/signin'));
}
