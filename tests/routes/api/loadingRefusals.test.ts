/**
 * The mix and solve APIs refuse recipes that cannot be weighed (a slurry stays below
 * 100 wt %) with 422 and a plain reason, and report which model produced the numbers.
 */
import { describe, expect, it } from 'vitest';
import { POST as mixPost } from '../../../src/routes/api/v1/mix/+server';
import { POST as solvePost } from '../../../src/routes/api/v1/solve/+server';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend';
import { call, jsonEvent } from './support';

const components = { pump: BLUE_PUMP, phosphors: [demoPhosphor('ph-yl568'), demoPhosphor('ph-rd625')] };

describe('POST /api/v1/mix with the loading model', () => {
  it('answers 422 when the wt % add up to 100 or more', async () => {
    const ratios = { kind: 'loading', concentrationsWtPct: [70, 30], loading: { pathLengthMm: 0.3 } };
    const { status, body } = await call(mixPost, jsonEvent({ components, ratios }));
    expect(status).toBe(422);
    expect(body.error).toMatch(/100\.0 wt %/);
  });

  it('answers 400 for an unknown dispense geometry and 200 for a fixed cavity volume', async () => {
    const bad = { kind: 'loading', concentrationsWtPct: [20, 3], loading: { pathLengthMm: 0.3, geometry: 'sprayed' } };
    expect((await call(mixPost, jsonEvent({ components, ratios: bad }))).status).toBe(400);
    const ok = { kind: 'loading', concentrationsWtPct: [20, 3], loading: { pathLengthMm: 0.3, geometry: 'fixedVolume' } };
    const { status, body } = await call(mixPost, jsonEvent({ components, ratios: ok }));
    expect(status).toBe(200);
    expect(body.loading.pumpTransmission).toBeGreaterThan(0);
  });
});

describe('POST /api/v1/solve with the loading model', () => {
  const problem = (pathLengthMm: number, cascade: boolean) => ({
    components,
    target: { kind: 'ansiBin', nominalCct: 3000 },
    objective: 'maxLer',
    loading: { pathLengthMm, cascade }
  });

  it('answers 422 with the reason when no proposal can be weighed', async () => {
    const { status, body } = await call(solvePost, jsonEvent(problem(0.01, true)));
    expect(status).toBe(422);
    expect(body.error).toMatch(/No proposal can be weighed/);
    expect(body.error).toMatch(/A path of at least/);
  });

  it('names the model that produced the numbers', async () => {
    const { status, body } = await call(solvePost, jsonEvent(problem(0.3, true)));
    expect(status).toBe(200);
    expect(body.model.label).toBe('loading model with re-absorption, 0.30 mm');
    expect(body.candidates[0].concentrationsWtPct).toHaveLength(2);
  });
});
