/**
 * Batches that cannot be stored are refused, not clipped: the 100 kg limit also holds for a size
 * derived from a part count (create, preview, scale), and grams finer than the 6 decimal places of
 * the batch tables' DECIMAL columns (a 1e-7 g balance step was saved as 0) are refused with a clear
 * message. Nothing is saved by a refused request.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { POST as create } from '../../../src/routes/api/v1/batches/+server';
import { POST as preview } from '../../../src/routes/api/v1/batches/preview/+server';
import { POST as scale } from '../../../src/routes/api/v1/batches/[id]/scale/+server';
import { GET as getOne } from '../../../src/routes/api/v1/batches/[id]/+server';
import { call } from './support';
import { demoUser, makeFixture, request, type Fixture } from '../../server/batches/support';
import type { User } from '../../../src/lib/server/accounts/users';

let fx: Fixture;
let tech: User;
beforeAll(async () => {
  fx = await makeFixture();
  tech = await demoUser('technician');
});
afterAll(closeDb);

function ev(body: unknown, params: Record<string, string> = {}) {
  return {
    request: new Request('http://local/api', {
      method: 'POST',
      body: JSON.stringify(body),
      headers: { 'content-type': 'application/json' }
    }),
    url: new URL('http://local/api'),
    params,
    locals: { user: tech, viaToken: false, denied: null }
  };
}

const batchCount = async () => Number((await db()('batches').count({ n: '*' }))[0].n);
const parts = (partCount: number, dispenseMassG: number) => ({ kind: 'parts', partCount, dispenseMassG, yieldLossPct: 15 });

describe('batch size from a part count', () => {
  it('refuses 1,000,000 parts × 150 g (≈ 176 t) on create and preview with the 100 kg message, saving nothing', async () => {
    const before = await batchCount();
    for (const handler of [create, preview]) {
      const res = await call(handler, ev({ ...request(fx.revisionId), sizing: parts(1_000_000, 150) }));
      expect(res.status).toBe(400);
      expect(res.body.issues[0].path).toBe('sizing.partCount');
      expect(res.body.issues[0].message).toMatch(/batch size must be at most 100 kg/);
    }
    expect(await batchCount()).toBe(before);
  });

  it('accepts a part count just inside the limit: 850 parts × 100 g ÷ 0.85 = 100,000 g', async () => {
    const res = await call(preview, ev({ ...request(fx.revisionId), sizing: parts(850, 100) }));
    expect(res.status).toBe(200);
    expect(res.body.plan.batchMassG).toBe('100000.000');
    const over = await call(preview, ev({ ...request(fx.revisionId), sizing: parts(851, 100) }));
    expect(over.status).toBe(400);
  });

  it('refuses scaling a planned batch past 100 kg by a factor (422) and leaves it as it was', async () => {
    const made = await call(create, ev({ ...request(fx.revisionId), sizing: { kind: 'mass', batchMassG: 2000 } }));
    expect(made.status).toBe(201);
    const id = String(made.body.id);
    const before = (await call(getOne, ev(undefined, { id }))).body;
    const res = await call(scale, ev({ version: before.version, factor: 60 }, { id }));
    expect(res.status).toBe(422);
    expect(res.body.error).toMatch(/batch size must be at most 100 kg/);
    const after = (await call(getOne, ev(undefined, { id }))).body;
    expect(after.batchMassG).toBe(before.batchMassG);
    expect(after.version).toBe(before.version);
  });
});

describe('values finer than the stored precision (DECIMAL(…, 6) grams)', () => {
  const cases: [string, (r: ReturnType<typeof request>) => unknown, string][] = [
    ['balance step 1e-7 g', (r) => ({ ...r, balance: { ...r.balance, resolutionG: 1e-7 } }), 'balance.resolutionG'],
    ['minimum weight 0.0500001 g', (r) => ({ ...r, balance: { ...r.balance, minWeightG: 0.0500001 } }), 'balance.minWeightG'],
    [
      'tolerance 0.0000005 g',
      (r) => ({
        ...r,
        phosphorTolerances: [
          { kind: 'g', value: 0.0000005 },
          { kind: 'pct', value: 1 }
        ]
      }),
      'phosphorTolerances.0.value'
    ],
    ['dispense mass 0.0250001 g', (r) => ({ ...r, sizing: parts(100, 0.0250001) }), 'sizing.dispenseMassG'],
    ['batch size 10.0000001 g', (r) => ({ ...r, sizing: { kind: 'mass', batchMassG: 10.0000001 } }), 'sizing.batchMassG']
  ];
  for (const [what, body, path] of cases)
    it(`refuses ${what} with 400 naming the stored precision, saving nothing`, async () => {
      const before = await batchCount();
      const res = await call(create, ev(body(request(fx.revisionId))));
      expect(res.status).toBe(400);
      expect(res.body.issues[0].path).toBe(path);
      expect(res.body.issues[0].message).toMatch(/cannot be finer than 0\.000001 (g|%) \(6 decimal places are stored\)/);
      expect(await batchCount()).toBe(before);
    });

  it('stores a 1 µg balance step exactly (the finest the column keeps)', async () => {
    const res = await call(create, ev({ ...request(fx.revisionId), balance: { resolutionG: 0.000001, minWeightG: 0 } }));
    expect(res.status).toBe(201);
    const row = (await db()('batches').where({ id: res.body.id }).first())!;
    expect(Number(row.resolution_g)).toBe(0.000001);
    const lines = await db()('batch_lines').where({ batch_id: res.body.id }).orderBy('seq');
    // Lines add up to the batch exactly (sum of targets = batch mass), as before the fix.
    const sum = lines.reduce((a: number, l: { target_g: string | number }) => a + Math.round(Number(l.target_g) * 1e6), 0);
    expect(sum).toBe(Math.round(Number(row.batch_mass_g) * 1e6));
  });
});
