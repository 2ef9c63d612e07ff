import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import type { User } from '../../../src/lib/server/accounts/users';
import * as collection from '../../../src/routes/api/v1/formulations/+server';
import * as one from '../../../src/routes/api/v1/formulations/[id]/+server';
import * as revisions from '../../../src/routes/api/v1/formulations/[id]/revisions/+server';
import * as revision from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/+server';
import * as submitRoute from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/submit/+server';
import * as approveRoute from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/approve/+server';
import * as returnRoute from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/return/+server';
import * as withdrawRoute from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/withdraw/+server';
import { call } from './support';
import { DEMO_PASSWORD, cast, uniqueCode, warmWhite, type Cast } from '../../server/formulations/support';

let c: Cast;

function event(user: User | null, opts: { body?: unknown; params?: Record<string, string>; query?: string; method?: string } = {}) {
  const url = new URL(`http://local/api/v1/formulations${opts.query ?? ''}`);
  const init: RequestInit =
    opts.body === undefined
      ? { method: opts.method ?? 'GET' }
      : { method: opts.method ?? 'POST', body: JSON.stringify(opts.body), headers: { 'content-type': 'application/json' } };
  return { request: new Request(url, init), url, params: opts.params ?? {}, locals: { user, viaToken: false, denied: null } };
}

async function created(user: User) {
  const code = uniqueCode('API');
  const res = await call(collection.POST, event(user, { body: { code, name: `API ${code}`, content: await warmWhite() } }));
  expect(res.status).toBe(201);
  return { ...(res.body as { formulationId: number; revisionId: number }), code };
}

const path = (f: { formulationId: number; revisionId: number }) => ({ id: String(f.formulationId), revisionId: String(f.revisionId) });
const rowOf = async (id: number) => (await db()('formulation_revisions').where({ id }).first())!;

describe('/api/v1/formulations', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('creates a formulation with its first draft (201) and reads it back', async () => {
    const f = await created(c.rhea);
    const got = await call(one.GET, event(c.tomas, { params: { id: String(f.formulationId) } }));
    expect(got.status).toBe(200);
    expect(got.body.formulation.code).toBe(f.code);
    expect(got.body.current).toBeNull();
    expect(got.body.revisions).toHaveLength(1);
    const rev = await call(revision.GET, event(c.tomas, { params: path(f) }));
    expect(rev.body).toMatchObject({ state: 'draft', revisionNo: 1, version: 1, signatures: [] });
    expect(rev.body.predicted.spd.values).toHaveLength(471);
  });

  it('answers 400 with the reason for invalid content and saves nothing', async () => {
    const before = (await db()('formulations').count({ n: '*' }))[0].n;
    const content = await warmWhite();
    const res = await call(collection.POST, event(c.rhea, { body: { name: 'x', content: { ...content, phosphors: [] } } }));
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/Phosphors: needs at least one phosphor|Phosphors: at least one phosphor/);
    expect((await db()('formulations').count({ n: '*' }))[0].n).toBe(before);
  });

  it('lists with filter, sort and paging on the server; a bad parameter is a 400', async () => {
    const f = await created(c.rhea);
    const res = await call(collection.GET, event(c.tomas, { query: `?q=${f.code}&sort=name&dir=desc&pageSize=5` }));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 1, page: 1, pageSize: 5, pages: 1 });
    expect(res.body.rows[0]).toMatchObject({ code: f.code, drafts: 1, currentRevisionId: null });
    const paged = await call(collection.GET, event(c.tomas, { query: '?pageSize=1&page=2&sort=code' }));
    expect(paged.body.rows).toHaveLength(1);
    expect(paged.body.total).toBeGreaterThan(1);
    expect((await call(collection.GET, event(c.tomas, { query: '?sort=colour' }))).status).toBe(400);
    const revs = await call(revisions.GET, event(c.tomas, { params: { id: String(f.formulationId) }, query: '?state=draft' }));
    expect(revs.body.rows.map((r: { state: string }) => r.state)).toEqual(['draft']);
  });

  it('updates a draft with its version; a stale version is a 409 and changes nothing', async () => {
    const f = await created(c.rhea);
    const ok = await call(
      revision.PUT,
      event(c.rhea, { method: 'PUT', params: path(f), body: { version: 1, content: await warmWhite({ notes: 'v2' }) } })
    );
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ version: 2 });
    const before = await rowOf(f.revisionId);
    const stale = await call(
      revision.PUT,
      event(c.rhea, { method: 'PUT', params: path(f), body: { version: 1, content: await warmWhite({ notes: 'old screen' }) } })
    );
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/you have version 1, it is now version 2/);
    expect(await rowOf(f.revisionId)).toEqual(before);
  });

  it('refuses edits of a submitted revision (409) and leaves the row as it was', async () => {
    const f = await created(c.rhea);
    expect((await call(submitRoute.POST, event(c.rhea, { params: path(f), body: { version: 1 } }))).status).toBe(200);
    const before = await rowOf(f.revisionId);
    const res = await call(
      revision.PUT,
      event(c.rhea, {
        method: 'PUT',
        params: path(f),
        body: { version: before.version, content: await warmWhite({ notes: 'after submit' }) }
      })
    );
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/revision is submitted/);
    expect(await rowOf(f.revisionId)).toEqual(before);
  });

  it("approves only with the right password, never one's own revision, and only for quality", async () => {
    const f = await created(c.rhea);
    await call(submitRoute.POST, event(c.rhea, { params: path(f), body: {} }));
    const wrong = await call(approveRoute.POST, event(c.ines, { params: path(f), body: { password: 'guess', comment: '' } }));
    expect(wrong.status).toBe(403);
    expect(wrong.body.error).toMatch(/password is not correct/);
    const byFormulator = await call(approveRoute.POST, event(c.jonah, { params: path(f), body: { password: DEMO_PASSWORD } }));
    expect(byFormulator.status).toBe(403);
    expect((await rowOf(f.revisionId)).state).toBe('submitted');
    const ok = await call(approveRoute.POST, event(c.ines, { params: path(f), body: { password: DEMO_PASSWORD, comment: 'ok' } }));
    expect(ok.status).toBe(200);
    expect(ok.body.state).toBe('approved');
    const own = await created(c.admin);
    await call(submitRoute.POST, event(c.admin, { params: path(own), body: {} }));
    const self = await call(approveRoute.POST, event(c.admin, { params: path(own), body: { password: DEMO_PASSWORD } }));
    expect(self.status).toBe(403);
    expect(self.body.error).toMatch(/own revision/);
  });

  it('return needs a reason (400) and then signs it; a returned revision cannot be withdrawn (409)', async () => {
    const f = await created(c.rhea);
    await call(submitRoute.POST, event(c.rhea, { params: path(f), body: {} }));
    expect((await call(returnRoute.POST, event(c.ines, { params: path(f), body: { password: DEMO_PASSWORD } }))).status).toBe(400);
    const ret = await call(returnRoute.POST, event(c.ines, { params: path(f), body: { password: DEMO_PASSWORD, reason: 'Duv too high' } }));
    expect(ret.body).toMatchObject({ state: 'returned', returnReason: 'Duv too high' });
    const again = await call(withdrawRoute.POST, event(c.rhea, { params: path(f), body: { reason: 'not needed' } }));
    expect(again.status).toBe(409);
  });

  it('answers 404 for unknown ids and for a revision of another formulation', async () => {
    const f = await created(c.rhea);
    const g = await created(c.rhea);
    expect(
      (await call(revision.GET, event(c.rhea, { params: { id: String(g.formulationId), revisionId: String(f.revisionId) } }))).status
    ).toBe(404);
    expect((await call(one.GET, event(c.rhea, { params: { id: '999999' } }))).status).toBe(404);
    expect((await call(revisions.POST, event(c.rhea, { params: { id: 'abc' }, body: {} }))).status).toBe(404);
  });
});
