import { test, expect, request, type APIRequestContext } from '@playwright/test';
import { startApp, type AppInstance } from './support/instances';
import { BASE, DEMO, DEMO_PASSWORD, makeUser, postSignIn, testDb } from './support/accounts';
import { createApiToken, tokenContext } from './support/tokens';

// Two app instances behind one database: whatever one instance decides from shared state, the
// other must decide the same way (throttling counts, sessions, locks, approvals).
let second: AppInstance;
const contexts: APIRequestContext[] = [];

// The suite's own port is 4173 under `npm test`; a sandbox has its own port, so its second
// instance sits 1000 above it and two sandboxes never start theirs on the same port.
const OWN_PORT = Number(process.env.PORT ?? 4173);
const SECOND_PORT = Number(process.env.PF_SECOND_PORT ?? (OWN_PORT === 4173 ? 4178 : OWN_PORT + 1000));

// Under `npm run test:cluster` the second instance talks to another Galera node (PF_SECOND_DB_PORT).
test.beforeAll(async () => {
  second = await startApp(SECOND_PORT, process.env.PF_SECOND_DB_PORT ? { DB_PORT: process.env.PF_SECOND_DB_PORT } : {});
});

test.afterAll(async () => {
  for (const c of contexts) await c.dispose();
  await second?.stop();
});

async function ctxFor(base: string): Promise<APIRequestContext> {
  const c = await request.newContext({ baseURL: base });
  contexts.push(c);
  return c;
}

test('sign-in failures on both instances add up to one throttle', async () => {
  const email = 'two.instances@kestrelhollow.example';
  await makeUser(email, ['formulator'], 'right-password-123');
  const a = await ctxFor(BASE);
  const b = await ctxFor(second.url);
  for (let i = 0; i < 3; i++) expect(await postSignIn(a, email, 'wrong')).toContain('error=CredentialsSignin');
  for (let i = 0; i < 2; i++) expect(await postSignIn(b, email, 'wrong', second.url)).toContain('error=CredentialsSignin');
  // Five failures in 15 minutes across the two instances: the right password is refused on either.
  expect(await postSignIn(a, email, 'right-password-123')).toContain('error=CredentialsSignin');
  expect(await postSignIn(b, email, 'right-password-123', second.url)).toContain('error=CredentialsSignin');
});

test('a session made on one instance is honoured by the other (shared secret, no server state)', async () => {
  const email = 'two.sessions@kestrelhollow.example';
  await makeUser(email, ['quality'], 'right-password-123');
  const a = await ctxFor(BASE);
  expect(await postSignIn(a, email, 'right-password-123')).not.toContain('error');
  const state = await a.storageState();
  const b = await request.newContext({
    baseURL: second.url,
    storageState: { cookies: state.cookies.map((c) => ({ ...c, domain: '127.0.0.1' })), origins: [] }
  });
  contexts.push(b);
  const me = await b.get('/api/v1/me');
  expect(me.status()).toBe(200);
  expect((await me.json()).email).toBe(email);
});

// ---- Optimistic locking and approvals across the two instances ---------------------------------
// A: the suite's instance (BASE); B: the second instance. Both read and write the same rows.
const AUTHOR = { email: 'two.author@kestrelhollow.example', password: 'author-password-123' };
const APPROVER = { email: 'two.approver@kestrelhollow.example', password: 'approver-password-123' };
const APPROVER2 = { email: 'two.approver2@kestrelhollow.example', password: 'approver2-password-123' };
const ids: Record<string, number> = {};
const tokens: Record<string, string> = {};

async function both(who: string): Promise<{ a: APIRequestContext; b: APIRequestContext }> {
  const a = await tokenContext(BASE, tokens[who]);
  const b = await tokenContext(second.url, tokens[who]);
  contexts.push(a, b);
  return { a, b };
}

const unique = (prefix: string) =>
  `${prefix}-${Date.now().toString(36).toUpperCase()}${Math.floor(Math.random() * 1296)
    .toString(36)
    .toUpperCase()}`;

/** A content known to be valid: the first approved demo revision's (seeds/03_formulations.ts). */
async function validContent(): Promise<Record<string, unknown>> {
  const knex = testDb();
  try {
    const row = (await knex('formulation_revisions').where({ state: 'approved' }).orderBy('id').first('content_json'))!;
    expect(row?.content_json, 'the demo seed has an approved revision').toMatch(/^\{/);
    return JSON.parse(row.content_json);
  } finally {
    await knex.destroy();
  }
}

async function newDraft(
  api: APIRequestContext,
  notes: string
): Promise<{ formulationId: number; revisionId: number; content: Record<string, unknown> }> {
  const content = { ...(await validContent()), notes };
  const res = await api.post('/api/v1/formulations', { data: { code: unique('TI'), name: 'Two-instance test blend', content } });
  expect(res.status(), await res.text()).toBe(201);
  const body = await res.json();
  return { formulationId: body.formulationId, revisionId: body.revisionId, content };
}

test.describe('writes through both instances', () => {
  test.beforeAll(async () => {
    // The author may also sign as quality, so self-approval is refused by rule, not by role.
    ids.author = await makeUser(AUTHOR.email, ['formulator', 'quality'], AUTHOR.password);
    ids.approver = await makeUser(APPROVER.email, ['quality'], APPROVER.password);
    ids.approver2 = await makeUser(APPROVER2.email, ['quality'], APPROVER2.password);
    tokens.author = await createApiToken(AUTHOR.email, AUTHOR.password, 'two-instances');
    tokens.approver = await createApiToken(APPROVER.email, APPROVER.password, 'two-instances');
    tokens.approver2 = await createApiToken(APPROVER2.email, APPROVER2.password, 'two-instances');
  });

  test('a material read on A and edited on B: the stale edit on A gets 409 and overwrites nothing', async () => {
    const { a, b } = await both('author');
    const code = unique('TI');
    const created = await a.post('/api/v1/phosphors', {
      data: { code, name: 'Two-instance test garnet', iqe: 0.9, supplier: 'Larkspur Luminescent Materials' }
    });
    expect(created.status(), await created.text()).toBe(201);
    const id = (await created.json()).id as number;
    const knex = testDb();
    try {
      const read = await (await a.get(`/api/v1/phosphors/${id}`)).json();
      expect(read.version).toBe(1);
      const onB = await b.put(`/api/v1/phosphors/${id}`, { data: { version: read.version, name: 'Renamed on instance B', iqe: 0.85 } });
      expect(onB.status(), await onB.text()).toBe(200);
      expect((await onB.json()).version).toBe(2);

      const stale = await a.put(`/api/v1/phosphors/${id}`, {
        data: { version: read.version, name: 'Stale rename on instance A', iqe: 0.7 }
      });
      expect(stale.status()).toBe(409);
      const why = (await stale.json()).error as string;
      expect(why).toMatch(/changed by someone else/);
      expect(why).toContain('you edited version 1, it is now at version 2');
      expect(why).toMatch(/Nothing was saved/);
      // The row still holds B's edit, and only one update reached the audit trail.
      const row = (await knex('materials').where({ id }).first('name', 'iqe', 'version'))!;
      expect({ ...row, iqe: Number(row.iqe) }).toEqual({ name: 'Renamed on instance B', iqe: 0.85, version: 2 });
      const updates = await knex('audit_events')
        .where({ entity_type: 'material', entity_id: String(id), action: 'update' })
        .count<{ n: number }[]>('* as n');
      expect(Number(updates[0].n)).toBe(1);

      // Both instances write version 2 at the same moment: the row lock lets exactly one through.
      const t0 = Date.now();
      const race = await Promise.all([
        a.put(`/api/v1/phosphors/${id}`, { data: { version: 2, name: 'Race winner A' } }),
        b.put(`/api/v1/phosphors/${id}`, { data: { version: 2, name: 'Race winner B' } })
      ]);
      const statuses = race.map((r) => r.status());
      console.log(`two instances, same-version material edits at once: statuses ${statuses.join(' / ')} in ${Date.now() - t0} ms`);
      expect([...statuses].sort()).toEqual([200, 409]);
      const winner = statuses[0] === 200 ? 'Race winner A' : 'Race winner B';
      expect(await knex('materials').where({ id }).first('name', 'version')).toEqual({ name: winner, version: 3 });
    } finally {
      await knex.destroy();
      await a.delete(`/api/v1/phosphors/${id}`);
    }
  });

  test('a formulation draft read on A and saved on B: the stale save on A gets 409 and overwrites nothing', async () => {
    const { a, b } = await both('author');
    const draft = await newDraft(a, 'first draft');
    const path = `/api/v1/formulations/${draft.formulationId}/revisions/${draft.revisionId}`;
    const read = await (await a.get(path)).json();
    expect(read).toMatchObject({ state: 'draft', version: 1 });

    const onB = await b.put(path, { data: { version: read.version, content: { ...draft.content, notes: 'saved on instance B' } } });
    expect(onB.status(), await onB.text()).toBe(200);
    expect(await onB.json()).toMatchObject({ version: 2, content: { notes: 'saved on instance B' } });

    const stale = await a.put(path, { data: { version: read.version, content: { ...draft.content, notes: 'stale save on instance A' } } });
    expect(stale.status()).toBe(409);
    const why = (await stale.json()).error as string;
    expect(why).toContain('Someone changed this revision after you opened it (you have version 1, it is now version 2)');
    expect(why).toMatch(/Nothing was saved/);

    const knex = testDb();
    try {
      const row = (await knex('formulation_revisions').where({ id: draft.revisionId }).first('content_json', 'version', 'state'))!;
      expect({ notes: JSON.parse(row.content_json).notes, version: row.version, state: row.state }).toEqual({
        notes: 'saved on instance B',
        version: 2,
        state: 'draft'
      });
    } finally {
      await knex.destroy();
    }
  });

  test('submitted on A, approved with an e-signature on B; a second approval and self-approval are refused', async () => {
    const author = await both('author');
    const approver = await both('approver');
    const draft = await newDraft(author.a, 'to be approved across instances');
    const path = `/api/v1/formulations/${draft.formulationId}/revisions/${draft.revisionId}`;
    const submitted = await author.a.post(`${path}/submit`, { data: { version: 1 } });
    expect(submitted.status(), await submitted.text()).toBe(200);
    expect((await submitted.json()).state).toBe('submitted');

    // The author holds the quality role but may not sign off their own revision, on either instance.
    for (const api of [author.a, author.b]) {
      const self = await api.post(`${path}/approve`, { data: { password: AUTHOR.password } });
      expect(self.status()).toBe(403);
      expect((await self.json()).error).toMatch(/Nobody signs off their own revision/);
    }

    const approved = await approver.b.post(`${path}/approve`, { data: { password: APPROVER.password, comment: 'Signed on instance B' } });
    expect(approved.status(), await approved.text()).toBe(200);
    expect(await approved.json()).toMatchObject({ state: 'approved', decidedBy: ids.approver });

    // The decision is shared: instance A refuses a second approval (already decided).
    const again = await approver.a.post(`${path}/approve`, { data: { password: APPROVER.password } });
    expect(again.status()).toBe(409);
    expect((await again.json()).error).toMatch(/This revision is approved; "Sign and approve" needs it to be submitted/);
    const late = await author.a.post(`${path}/approve`, { data: { password: AUTHOR.password } });
    expect(late.status()).toBe(409);

    const knex = testDb();
    try {
      const signatures = await knex('revision_signatures')
        .where({ revision_id: draft.revisionId })
        .select('meaning', 'signer_id', 'comment');
      expect(signatures).toEqual([{ meaning: 'approved', signer_id: ids.approver, comment: 'Signed on instance B' }]);
      expect(await knex('formulation_revisions').where({ id: draft.revisionId }).first('state', 'decided_by', 'version')).toEqual({
        state: 'approved',
        decided_by: ids.approver,
        version: 3
      });
    } finally {
      await knex.destroy();
    }
  });

  test('two reviewers approve the same revision at once through A and B: one signature, one 409', async () => {
    const author = await both('author');
    const first = await both('approver');
    const other = await both('approver2');
    const draft = await newDraft(author.b, 'raced approval');
    const path = `/api/v1/formulations/${draft.formulationId}/revisions/${draft.revisionId}`;
    expect((await author.b.post(`${path}/submit`, { data: {} })).status()).toBe(200);

    const t0 = Date.now();
    const race = await Promise.all([
      first.a.post(`${path}/approve`, { data: { password: APPROVER.password } }),
      other.b.post(`${path}/approve`, { data: { password: APPROVER2.password } })
    ]);
    const statuses = race.map((r) => r.status());
    console.log(`two instances, simultaneous approvals: statuses ${statuses.join(' / ')} in ${Date.now() - t0} ms`);
    expect([...statuses].sort()).toEqual([200, 409]);
    const winner = statuses[0] === 200 ? ids.approver : ids.approver2;

    const knex = testDb();
    try {
      const signatures = await knex('revision_signatures').where({ revision_id: draft.revisionId }).select('meaning', 'signer_id');
      expect(signatures).toEqual([{ meaning: 'approved', signer_id: winner }]);
      expect(await knex('formulation_revisions').where({ id: draft.revisionId }).first('state', 'decided_by')).toEqual({
        state: 'approved',
        decided_by: winner
      });
    } finally {
      await knex.destroy();
    }
  });
});

test('50 batches planned at once, split over both instances: 50 distinct numbers and no error', async () => {
  const knex = testDb();
  let revisionId: number;
  try {
    const rev = await knex('formulation_revisions as r')
      .join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
      .first('r.id');
    revisionId = rev!.id;
  } finally {
    await knex.destroy();
  }
  const token = await createApiToken(DEMO.technician, DEMO_PASSWORD, 'two-instances batches');
  const a = await tokenContext(BASE, token);
  const b = await tokenContext(second.url, token);
  contexts.push(a, b);
  const body = {
    revisionId,
    sizing: { kind: 'mass', batchMassG: 10 },
    loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
    additives: [],
    balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-TWO' },
    plantLimitMin: 120,
    notes: 'planned at once on two instances'
  };
  const t0 = Date.now();
  const answers = await Promise.all(Array.from({ length: 50 }, (_, i) => (i % 2 ? b : a).post('/api/v1/batches', { data: body })));
  const statuses = answers.map((r) => r.status());
  console.log(`two instances, 50 simultaneous batch plans: ${statuses.filter((s) => s === 201).length} × 201 in ${Date.now() - t0} ms`);
  const refused = answers.find((r) => r.status() !== 201);
  expect(
    statuses.filter((s) => s !== 201),
    refused && (await refused.text())
  ).toEqual([]);
  const numbers = await Promise.all(answers.map(async (r) => (await r.json()).batchNumber as string));
  expect(new Set(numbers).size).toBe(50);
});
