/**
 * Hostile input on the API routes that write records: 1,000 generated malformed bodies each for
 * creating a phosphor, a formulation (with its first draft) and a batch. No answer may be an
 * exception (a 500), and a refused body must leave every table of that feature exactly as it was
 * (no partial saves). Texts holding SQL metacharacters and script tags are stored literally.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as phosphorPost } from '../../../src/routes/api/v1/phosphors/+server';
import { POST as formulationPost } from '../../../src/routes/api/v1/formulations/+server';
import { POST as batchPost } from '../../../src/routes/api/v1/batches/+server';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/db/users';
import type { User } from '../../../src/lib/server/db/users';

const hostileLeaf = fc.oneof(
  fc.constantFrom(null, true, '', 'NaN', '<script>alert(1)</script>', "x'); DROP TABLE materials; --", -1, 0, 1e308, 2 ** 53, '１２'),
  fc.double(),
  fc.string({ maxLength: 300 }),
  fc.array(fc.oneof(fc.double(), fc.string()), { maxLength: 6 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.integer(), { maxKeys: 3 })
);

function mutate(body: unknown, choices: number[], leaf: unknown): unknown {
  const clone = structuredClone(body) as Record<string, unknown>;
  let node: Record<string, unknown> = clone;
  for (const c of choices) {
    const keys = Object.keys(node);
    if (keys.length === 0) break;
    const k = keys[c % keys.length];
    const next = node[k];
    if (next && typeof next === 'object' && c % 3 !== 0) { node = next as Record<string, unknown>; continue; }
    if (c % 5 === 0 && !Array.isArray(node)) delete node[k];
    else node[k] = leaf;
    return clone;
  }
  node['extra'] = leaf;
  return clone;
}

function event(user: User, body: unknown) {
  return {
    request: new Request('http://local/api', { method: 'POST', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }),
    locals: { user, viaToken: true, denied: null },
    params: {},
    url: new URL('http://local/api')
  };
}

async function counts(tables: string[]): Promise<string> {
  const out: string[] = [];
  for (const t of tables) {
    const [{ n }] = await db()(t).count<{ n: number }[]>('* as n');
    out.push(`${t}=${n}`);
  }
  return out.join(' ');
}

let formulator: User;
let technician: User;
let approvedRevisionId: number;
let approvedContent: unknown;
let run = 0;

beforeAll(async () => {
  formulator = (await users.get((await db()('users').where({ email: 'rhea.okafor@kestrelhollow.example' }).first('id')).id))!;
  technician = (await users.get((await db()('users').where({ email: 'tomas.brand@kestrelhollow.example' }).first('id')).id))!;
  const rev = await db()('formulation_revisions').where({ state: 'approved' }).orderBy('id').first('id', 'content_json');
  approvedRevisionId = rev.id;
  approvedContent = JSON.parse(rev.content_json);
  run = Date.now() % 1e6;
});
afterAll(async () => {
  // Probe materials are unused, so they go; probe formulations and batches stay (records are permanent).
  const ids = (await db()('materials').where('code', 'like', `FZ-%`).select('id')).map((r) => r.id);
  if (ids.length) {
    await db()('materials').whereIn('id', ids).update({ emission_spectrum_id: null, excitation_spectrum_id: null });
    await db()('material_spectra').whereIn('material_id', ids).delete();
    await db()('material_lots').whereIn('material_id', ids).delete();
    await db()('materials').whereIn('id', ids).delete();
  }
  await closeDb();
});

const cases = () => [
  {
    name: 'POST /api/v1/phosphors',
    handler: phosphorPost,
    user: () => formulator,
    tables: ['materials', 'material_spectra', 'material_lots', 'stored_files'],
    valid: (i: number) => ({ code: `FZ-${run}-${i}`, name: 'Fuzz probe phosphor', family: 'fuzz probe family', iqe: 0.9, densityGCm3: 4.5, costPerKg: 900 })
  },
  {
    name: 'POST /api/v1/formulations',
    handler: formulationPost,
    user: () => formulator,
    tables: ['formulations', 'formulation_revisions', 'revision_signatures'],
    valid: (i: number) => ({ name: `Fuzz probe ${run}-${i}`, description: 'fuzz', content: approvedContent })
  },
  {
    name: 'POST /api/v1/batches',
    handler: batchPost,
    user: () => technician,
    tables: ['batches', 'batch_lines', 'stored_files'],
    valid: () => ({
      revisionId: approvedRevisionId,
      sizing: { kind: 'mass', batchMassG: 200 },
      loading: { mode: 'total', basis: 'wtPctOfSlurry', totalPct: 12 },
      additives: [],
      balance: { resolutionG: 0.01, minWeightG: 0.05 }
    })
  }
];

describe.each(cases().map((c) => [c.name, c] as const))('fuzzing %s', (_name, c) => {
  it('1,000 mutated bodies: no exception, and a refused body saves nothing', async () => {
    const tally = new Map<number, number>();
    let i = 0;
    let baseline = await counts(c.tables);
    await fc.assert(
      fc.asyncProperty(fc.array(fc.nat(50), { minLength: 1, maxLength: 6 }), hostileLeaf, async (choices, leaf) => {
        const before = baseline;
        const res = await c.handler(event(c.user(), mutate(c.valid(i++), choices, leaf)) as never);
        tally.set(res.status, (tally.get(res.status) ?? 0) + 1);
        expect(res.status, `status ${res.status}: ${await res.clone().text()}`).toBeLessThan(500);
        if (res.status >= 400) {
          expect(typeof (await res.json()).error).toBe('string');
          expect(await counts(c.tables)).toBe(before);
        } else {
          baseline = await counts(c.tables);
        }
      }),
      { numRuns: 1000, seed: 20261202 }
    );
    expect(tally.get(400) ?? 0).toBeGreaterThan(100);
    console.log(`fuzz ${c.name}: ${[...tally].map(([s, n]) => `${s}×${n}`).join(' ')}`);
  }, 300_000);
});

describe('hostile text is stored literally', () => {
  it('keeps SQL metacharacters and script tags as typed', async () => {
    const name = `<script>alert('x')</script>'; DROP TABLE materials; -- ${run}`;
    const res = await phosphorPost(event(formulator, { code: `FZ-LIT-${run}`, name, iqe: 0.9, notes: '" OR 1=1 -- \\ %_' }) as never);
    expect(res.status).toBe(201);
    const row = await db()('materials').where({ code: `FZ-LIT-${run}` }).first('name', 'notes');
    expect(row.name).toBe(name);
    expect(row.notes).toBe('" OR 1=1 -- \\ %_');
  });
});
