/**
 * POST /api/v1/solve at an operating condition, with the library's thermal data (seeded demo
 * values [from memory]): the hot solve sits on the target (ANSI C78.377 3000 K centre) within 0.5
 * step and carries the cold check; a component without thermal data is refused by name (422).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { loadBlendComponents } from '../../../src/lib/server/library/components';
import * as solve from '../../../src/routes/api/v1/solve/+server';
import { call, jsonEvent } from './support';

const idOf = async (code: string) => Number((await db()('materials').where({ code }).first('id'))!.id);
const HOT = { reference: 'junction', temperatureC: 85, driveCurrentMa: 350 };
const AT_3000 = { kind: 'ansiBin', nominalCct: 3000 };

describe('POST /api/v1/solve at a hot condition', () => {
  afterAll(closeDb);

  it('solves on the library thermal data and reports the cold check', async () => {
    const components = await loadBlendComponents(await idOf('B-450'), [await idOf('YG-555'), await idOf('RD-625')]);
    const r = await call(solve.POST, jsonEvent({ components, target: AT_3000, objective: 'maxLer', condition: HOT }));
    expect(r.status).toBe(200);
    expect(r.body.condition).toEqual(HOT);
    expect(r.body.shift.pumpShiftNm).toBeCloseTo(0.04 * 60, 9); // seeded 0.04 nm/K × 60 K, at the 350 mA reference
    const c = r.body.candidates[0];
    expect(c.chromaticityError.steps).toBeLessThan(0.5);
    expect(c.coldCheck.condition.temperatureC).toBe(25);
    expect(c.coldCheck.cct).toBeLessThan(c.evaluation.cct);
    const bench = await call(solve.POST, jsonEvent({ components, target: AT_3000, objective: 'maxLer' }));
    expect(bench.body.condition).toBeNull();
    expect(bench.body.candidates[0].coldCheck).toBeNull();
  });

  it('refuses a hot solve with an uncharacterised phosphor, naming it (422)', async () => {
    const components = await loadBlendComponents(await idOf('B-450'), [await idOf('YG-555'), await idOf('RD-650')]);
    const r = await call(solve.POST, jsonEvent({ components, target: AT_3000, objective: 'maxLer', condition: HOT }));
    expect(r.status).toBe(422);
    expect(r.body.error).toMatch(/not characterised at Tj 85 °C, 350 mA: RD-650 .*relative emission vs temperature/);
  });
});
