/**
 * POST /api/v1/batches and /preview for a revision with a recipe per chip bin: the chip lot's
 * wavelength picks the bin whose recipe is weighed; a lot outside every bin or an unknown bin code is
 * refused and saves nothing. Masses hand-worked in tests/lib/batches/chip-lot.test.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { POST } from '../../../src/routes/api/v1/batches/+server';
import { POST as PREVIEW } from '../../../src/routes/api/v1/batches/preview/+server';
import { getBatch } from '../../../src/lib/server/batches/read';
import { call, jsonEvent } from './support';
import { makeFixture, request, type Fixture } from '../../server/batches/support';

let fx: Fixture;
let plain: Fixture;
beforeAll(async () => {
  [fx, plain] = await Promise.all([makeFixture({ matrix: true }), makeFixture()]);
});
afterAll(closeDb);

const batchCount = async (revisionId: number) =>
  Number((await db()('batches').where({ revision_id: revisionId }).count({ n: '*' }).first())?.n ?? 0);
const plan = (chipLot: object | null | undefined, revisionId = fx.revisionId) =>
  jsonEvent({ ...request(revisionId), chipLot }, ['technician']);
const masses = (lines: { code: string; targetG: string }[]) => lines.map((l) => [l.code, l.targetG]);

describe('planning a batch for a revision with a recipe per chip bin', () => {
  it("a lot at 453.1 nm peak weighs bin B3's recipe and records the lot, the bin and the wavelength", async () => {
    const res = await call(POST, plan({ lotNumber: 'KH-CHIP-0417', wavelengthNm: 453.1 }));
    expect(res.status).toBe(201);
    const detail = (await getBatch(res.body.id))!;
    // Bin B3, 6.5 + 2.4 wt % at 10.000 g on 10:1 silicone: worked by hand in tests/lib/batches/chip-lot.test.ts.
    expect(masses(detail.lines)).toEqual([
      ['PART A', '8.282'],
      [expect.stringMatching(/^TG-/), '0.650'],
      [expect.stringMatching(/^TR-/), '0.240'],
      ['PART B', '0.828']
    ]);
    expect(detail.batch).toMatchObject({ chipLot: 'KH-CHIP-0417', chipBinCode: 'B3', chipWavelengthNm: 453.1 });
  });

  it('the preview answers the same bin and its predicted point, without saving', async () => {
    const before = await batchCount(fx.revisionId);
    const res = await call(PREVIEW, plan({ lotNumber: 'KH-CHIP-0418', binCode: 'b1' }));
    expect(res.status).toBe(200);
    expect(res.body.chipLot).toMatchObject({ binCode: 'B1', bin: { code: 'B1', basis: 'peak', fromNm: 447.5, toNm: 450 } });
    expect(res.body.predicted).toMatchObject({ x: 0.434, y: 0.402 });
    expect(masses(res.body.plan.lines)[1][1]).toBe('0.750'); // 10 g × 7.5 wt %
    expect(await batchCount(fx.revisionId)).toBe(before);
  });

  it.each([
    {
      name: 'a lot outside every bin',
      chipLot: { lotNumber: 'KH-CHIP-0999', wavelengthNm: 458 },
      says: /458 nm \(peak wavelength\) lies outside every bin of this pump \(447\.5–455 nm\)/
    },
    {
      name: 'a bin code the matrix lacks',
      chipLot: { lotNumber: 'KH-CHIP-0999', binCode: 'C4' },
      says: /no recipe for chip bin C4 \(its recipes are for B1, B2, B3\)/
    },
    { name: 'no chip lot', chipLot: undefined, says: /recipe per chip bin \(B1, B2, B3\): enter the chip lot number/ }
  ])('refuses $name with the reason (400) and saves no batch', async ({ chipLot, says }) => {
    const before = await batchCount(fx.revisionId);
    const res = await call(POST, plan(chipLot));
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(says);
    expect(res.body.error).not.toMatch(/chipLot\.|src\//);
    expect(await batchCount(fx.revisionId)).toBe(before);
  });

  it('without a matrix the chip lot is optional and recorded when given', async () => {
    const without = await call(POST, plan(undefined, plain.revisionId));
    expect(without.status).toBe(201);
    expect((await getBatch(without.body.id))!.batch.chipLot).toBeNull();
    const withLot = await call(POST, plan({ lotNumber: 'KH-CHIP-0100' }, plain.revisionId));
    expect(withLot.status).toBe(201);
    const detail = (await getBatch(withLot.body.id))!;
    expect(detail.batch).toMatchObject({ chipLot: 'KH-CHIP-0100', chipBinCode: null });
    expect(masses(detail.lines)[1][1]).toBe('0.700'); // the one recipe, 7 wt %
  });
});
