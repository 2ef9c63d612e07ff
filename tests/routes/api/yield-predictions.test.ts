import { describe, expect, it } from 'vitest';
import { POST } from '../../../src/routes/api/v1/yield-predictions/+server';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend';
import { call, jsonEvent } from './support';

const components = { pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yg555', 'ph-rd625'].map(demoPhosphor) };
const body = {
  components,
  concentrationsWtPct: [3, 6, 2],
  loading: { pathLengthMm: 0.3 },
  target: { kind: 'ansiBin', nominalCct: 3000 },
  tolerance: { kind: 'sdcm', steps: 3 },
  parts: 2000,
  seed: 7
};

describe('POST /api/v1/yield-predictions', () => {
  it('returns the seeded cloud, the yield figures and the breakdown, the same twice', async () => {
    const a = await call(POST, jsonEvent(body));
    expect(a.status).toBe(200);
    expect(a.body.cloud.x).toHaveLength(2000);
    expect(a.body.figures.inSteps.map((s: { steps: number }) => s.steps)).toEqual([1, 2, 3, 5, 7]);
    expect(a.body.figures.inAnsiQuadrangle).toBeGreaterThanOrEqual(0);
    expect(a.body.breakdown.sources.reduce((s: number, x: { share: number }) => s + x.share, 0)).toBeCloseTo(1, 9);
    const b = await call(POST, jsonEvent(body));
    expect(b.body.cloud).toEqual(a.body.cloud);
    expect(b.body.figures).toEqual(a.body.figures);
  });

  it('answers 400 for more than 100,000 parts and 422 for a recipe of the wrong length', async () => {
    expect((await call(POST, jsonEvent({ ...body, parts: 100_001 }))).status).toBe(400);
    const r = await call(POST, jsonEvent({ ...body, concentrationsWtPct: [3, 6] }));
    expect(r.status).toBe(422);
    expect(r.body.error).toMatch(/expected 3 values/);
  });
});
