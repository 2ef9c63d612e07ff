import { describe, expect, it } from 'vitest';
import { POST as mixPost } from '../../../src/routes/api/v1/mix/+server';
import { POST as solvePost } from '../../../src/routes/api/v1/solve/+server';
import { POST as correctPost } from '../../../src/routes/api/v1/correct/+server';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend';
import { cctDuvToXy } from '../../../src/lib/spectral';
import { call, jsonEvent } from './support';

const components = {
  pump: BLUE_PUMP,
  phosphors: [demoPhosphor('ph-gl530'), demoPhosphor('ph-yl568'), demoPhosphor('ph-rd625')]
};

describe('POST /api/v1/mix', () => {
  it('returns an SPD and metrics for optical fractions', async () => {
    const { status, body } = await call(mixPost, jsonEvent({ components, ratios: { kind: 'optical', fractions: [0.2, 0.3, 0.3, 0.2] } }));
    expect(status).toBe(200);
    expect(body.spd.wavelengths.length).toBe(body.spd.values.length);
    expect(body.evaluation.cct).toBeGreaterThan(1500);
    expect(body.opticalFractions.reduce((a: number, b: number) => a + b, 0)).toBeCloseTo(1, 9);
  });

  // An answer names each knob and its colour shifts only; the spectra were sent by the caller and are not echoed back.
  const SENSITIVITY_KEYS = ['dCct', 'dDuv', 'dx', 'dy', 'id', 'name'];

  it('gives sensitivities as { id, name, dx, dy, dCct, dDuv } only (optical fractions)', async () => {
    const { status, body } = await call(mixPost, jsonEvent({ components, ratios: { kind: 'optical', fractions: [0.2, 0.3, 0.3, 0.2] } }));
    expect(status).toBe(200);
    expect(body.sensitivities).toHaveLength(4);
    for (const s of body.sensitivities) expect(Object.keys(s).sort()).toEqual(SENSITIVITY_KEYS);
    expect(body.sensitivities.map((s: { id: string }) => s.id)).toEqual([components.pump.id, ...components.phosphors.map((p) => p.id)]);
    // Four labels and four numbers each: well under 1 kB (a single 471-point spectrum alone is several kB).
    expect(JSON.stringify(body.sensitivities).length).toBeLessThan(1000);
  });

  it('gives sensitivities with the same keys on the loading model (wt %)', async () => {
    const { status, body } = await call(
      mixPost,
      jsonEvent({ components, ratios: { kind: 'loading', concentrationsWtPct: [3, 6, 2], loading: { pathLengthMm: 0.3 } } })
    );
    expect(status).toBe(200);
    expect(body.sensitivities).toHaveLength(3);
    for (const s of body.sensitivities) expect(Object.keys(s).sort()).toEqual(SENSITIVITY_KEYS);
    expect(JSON.stringify(body.sensitivities).length).toBeLessThan(800);
  });

  it('answers 422 when the fraction count does not match the components', async () => {
    const { status, body } = await call(mixPost, jsonEvent({ components, ratios: { kind: 'optical', fractions: [0.5, 0.5] } }));
    expect(status).toBe(422);
    expect(body.error).toMatch(/expected 4 values/);
  });

  it('answers 400 for a negative fraction', async () => {
    const { status } = await call(mixPost, jsonEvent({ components, ratios: { kind: 'optical', fractions: [-1, 0.3, 0.3, 0.2] } }));
    expect(status).toBe(400);
  });
});

describe('POST /api/v1/solve', () => {
  it('finds a 3000 K blend inside 3 SDCM with its floors met', async () => {
    const { status, body } = await call(
      solvePost,
      jsonEvent({
        components,
        target: { kind: 'cctDuv', cct: 3000, duv: 0 },
        floors: { raMin: 80 },
        objective: 'maxLer'
      })
    );
    expect(status).toBe(200);
    expect(body.status).toBe('ok');
    const best = body.candidates[0];
    // ANSI C78.377: 3000 K nominal, and a 3-step MacAdam target is common practice.
    expect(best.evaluation.cct).toBeGreaterThan(2870);
    expect(best.evaluation.cct).toBeLessThan(3130);
    expect(best.evaluation.cri.ra).toBeGreaterThanOrEqual(80);
  });

  it('answers 400 for an unknown objective', async () => {
    const { status, body } = await call(
      solvePost,
      jsonEvent({ components, target: { kind: 'cctDuv', cct: 3000, duv: 0 }, objective: 'fastest' })
    );
    expect(status).toBe(400);
    expect(body.error).toMatch(/objective/i);
  });
});

describe('POST /api/v1/correct', () => {
  it('returns corrected ratios for measured points off target', async () => {
    const [tx, ty] = cctDuvToXy(3000, 0);
    const target = { x: tx, y: ty };
    const { status, body } = await call(
      correctPost,
      jsonEvent({
        components,
        recipe: { kind: 'optical', fractions: [0.2, 0.3, 0.3, 0.2] },
        measured: { kind: 'xy', points: [{ x: target.x + 0.01, y: target.y + 0.005 }] },
        target: { kind: 'cctDuv', cct: 3000, duv: 0 }
      })
    );
    expect(status).toBe(200);
    expect(body.multipliers).toHaveLength(3);
    expect(body.measuredMean.x).toBeCloseTo(target.x + 0.01, 9);
    for (const s of body.sensitivities) expect(Object.keys(s).sort()).toEqual(['dCct', 'dDuv', 'dx', 'dy', 'id', 'name']);
    expect(JSON.stringify(body.sensitivities).length).toBeLessThan(1000);
  });

  it('answers 422 with the reason when the trim would need a phosphor at or below zero (gross offset)', async () => {
    const [tx, ty] = cctDuvToXy(3000, 0);
    const { status, body } = await call(
      correctPost,
      jsonEvent({
        components,
        recipe: { kind: 'optical', fractions: [0.2, 0.3, 0.3, 0.2] },
        measured: { kind: 'xy', points: [{ x: tx + 0.1, y: ty - 0.1 }] },
        target: { kind: 'cctDuv', cct: 3000, duv: 0 }
      })
    );
    expect(status).toBe(422);
    expect(body.error).toMatch(/without taking YL-568 garnet yellow to zero or below/);
  });
});
