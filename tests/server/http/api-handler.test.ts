/**
 * apiHandler, the one wrapper of the /api endpoints: every throw becomes `{ error, issues? }`
 * with the status of its cause (RFC 9110 §15: 400 bad request, 401 unauthenticated, 404, 409,
 * 422, 500 internal error, 503 unavailable with Retry-After §10.2.3).
 */
import { error, isRedirect, redirect } from '@sveltejs/kit';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { conflict, invalid, notFound } from '../../../src/lib/errors/domain-error';
import { SpectrumInputError } from '../../../src/lib/spectral/errors';
import { BlendInputError } from '../../../src/lib/blend/errors';
import { ConflictError, PermissionError } from '../../../src/lib/server/formulations/errors';
import { AccountError } from '../../../src/lib/server/accounts/service';
import { apiHandler, DB_UNAVAILABLE, UNEXPECTED } from '../../../src/lib/server/http/api-handler';

async function answer(thrown: unknown) {
  const res = await apiHandler(() => {
    throw thrown;
  });
  return { status: res.status, body: await res.json(), retryAfter: res.headers.get('retry-after') };
}

afterEach(() => vi.restoreAllMocks());

describe('apiHandler', () => {
  it('passes a handler answer through untouched', async () => {
    const res = await apiHandler(async () => new Response('ok', { status: 201 }));
    expect(res.status).toBe(201);
    expect(await res.text()).toBe('ok');
  });

  it('answers a domain error with its kind status, message and issues', async () => {
    expect(await answer(notFound('Batch 7 was not found.'))).toMatchObject({ status: 404, body: { error: 'Batch 7 was not found.' } });
    expect(await answer(conflict('Reload, then try again.'))).toMatchObject({ status: 409, body: { error: 'Reload, then try again.' } });
    const withIssues = await answer(invalid('Fix the fields.', [{ path: 'name', message: 'required' }]));
    expect(withIssues).toMatchObject({ status: 400, body: { error: 'Fix the fields.', issues: [{ path: 'name', message: 'required' }] } });
  });

  it("answers the features' own refusals without knowing their classes", async () => {
    expect(await answer(new SpectrumInputError('values must be finite'))).toMatchObject({
      status: 422,
      body: { error: 'Spectrum rejected: values must be finite' }
    });
    expect(await answer(new BlendInputError('ratios must sum to 1'))).toMatchObject({
      status: 422,
      body: { error: 'Blend rejected: ratios must sum to 1' }
    });
    expect((await answer(new ConflictError('stale', { version: 2, state: 'draft' }))).status).toBe(409);
    expect((await answer(new PermissionError('not yours'))).status).toBe(403);
    expect((await answer(new AccountError('taken'))).status).toBe(409);
  });

  it('answers a zod error with 400 and its issues by path', async () => {
    const parsed = z.object({ batchMassG: z.number().positive('must be > 0') }).safeParse({ batchMassG: -1 });
    const a = await answer(parsed.error);
    expect(a.status).toBe(400);
    expect(a.body.issues).toEqual([{ path: 'batchMassG', message: 'must be > 0' }]);
    // The message names the field by its label, the issue keeps the path for programs.
    expect(a.body.error).toBe('Invalid request: Batch mass: must be > 0');
  });

  it('answers SvelteKit errors (sign-in, role) with their status in the same body shape', async () => {
    expect(await answer(captured(() => error(401, 'Sign-in required.')))).toMatchObject({
      status: 401,
      body: { error: 'Sign-in required.' }
    });
    const forbidden = await answer(
      captured(() => error(403, { message: 'Forbidden', reason: 'This needs one of the roles: quality, admin.' }))
    );
    expect(forbidden).toMatchObject({ status: 403, body: { error: 'Forbidden: This needs one of the roles: quality, admin.' } });
    expect(Object.keys(forbidden.body)).toEqual(['error']);
  });

  it('answers a database outage with 503 and Retry-After', async () => {
    const outage = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:33306'), { code: 'ECONNREFUSED', fatal: true });
    expect(await answer(outage)).toEqual({ status: 503, body: { error: DB_UNAVAILABLE }, retryAfter: '5' });
  });

  it('answers anything else with a logged 500 that names no internals', async () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const a = await answer(new TypeError("Cannot read properties of undefined (reading 'x') at /srv/app/src/lib/server/x.ts"));
    expect(a).toMatchObject({ status: 500, body: { error: UNEXPECTED } });
    expect(JSON.stringify(a.body)).not.toMatch(/src\/|TypeError/);
    expect(log).toHaveBeenCalledOnce();
  });

  it('lets a redirect through', async () => {
    const thrown = await apiHandler(() => redirect(303, '/signin')).catch((e) => e);
    expect(isRedirect(thrown)).toBe(true);
  });
});

function captured(run: () => never): unknown {
  try {
    run();
  } catch (err) {
    return err;
  }
}
