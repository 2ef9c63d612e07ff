import { describe, expect, it } from 'vitest';
import { mix } from '../../src/lib/blend/mix';
import { correctionRequestSchema, mixRequestSchema, solveProblemSchema } from '../../src/lib/blend/schemas';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { DEMO_PHOSPHORS } from '../../src/lib/blend/demo-components';
import { THREE } from './fixtures';

describe('zod schemas of the API bodies', () => {
  it('a demo solve problem parses and solves', () => {
    const body = JSON.parse(
      JSON.stringify({
        components: THREE,
        target: { kind: 'ansiBin', nominalCct: 3000 },
        floors: { raMin: 90, r9Min: 50 },
        objective: 'maxLer',
        tolerance: { kind: 'sdcm', steps: 3 }
      })
    );
    const parsed = solveProblemSchema.parse(body);
    expect(solveBlend(parsed).status).toBe('ok');
  });

  it('rejects bad bodies with readable messages', () => {
    const one = solveProblemSchema.safeParse({
      components: { ...THREE, phosphors: THREE.phosphors.slice(0, 1) },
      target: { kind: 'ansiBin', nominalCct: 3000 },
      objective: 'maxLer'
    });
    expect(one.success).toBe(false);
    expect(JSON.stringify(one.error?.issues)).toMatch(/at least 2 phosphors/);
    const obj = solveProblemSchema.safeParse({ components: THREE, target: { kind: 'ansiBin', nominalCct: 3000 }, objective: 'fastest' });
    expect(JSON.stringify(obj.error?.issues)).toMatch(/objective must be/);
    const pump = mixRequestSchema.safeParse({
      components: { pump: { id: 'p', name: 'p' }, phosphors: THREE.phosphors },
      ratios: { kind: 'optical', fractions: [1, 1, 1, 1] }
    });
    expect(JSON.stringify(pump.error?.issues)).toMatch(/measured spectrum or parametric/);
    const spd = mixRequestSchema.safeParse({
      components: { ...THREE, phosphors: [{ ...THREE.phosphors[0], emission: { wavelengths: [1, 2, 3, 4, 5], values: [1, 2] } }] },
      ratios: { kind: 'optical', fractions: [1, 1] }
    });
    expect(JSON.stringify(spd.error?.issues)).toMatch(/same length/);
  });

  it('correction request with measured spectra parses', () => {
    const r = correctionRequestSchema.safeParse({
      components: THREE,
      recipe: { kind: 'optical', fractions: [0.07, 0.2, 0.27, 0.46] },
      measured: { kind: 'spd', spectra: [THREE.phosphors[1].emission] },
      target: { kind: 'cctDuv', cct: 3000, duv: 0 }
    });
    expect(r.success).toBe(true);
  });
});

describe('mix', () => {
  it('optical and loading forms return an SPD, metrics and sensitivities', () => {
    const a = mix(THREE, { kind: 'optical', fractions: [7, 20, 27, 46] });
    expect(a.opticalFractions.reduce((s, v) => s + v, 0)).toBeCloseTo(1, 12);
    expect(a.spd.wavelengths).toHaveLength(471);
    expect(a.evaluation.cri.ra).toBeGreaterThan(0);
    expect(a.sensitivities).toHaveLength(4);
    const b = mix(THREE, { kind: 'loading', concentrationsWtPct: [3, 6, 2], loading: { pathLengthMm: 0.3, cascade: true } });
    expect(b.loading?.pumpTransmission).toBeGreaterThan(0);
    expect(b.loading?.pumpTransmission).toBeLessThan(1);
    expect(b.sensitivities).toHaveLength(3);
  });

  it('rejects a ratio vector of the wrong length', () => {
    expect(() => mix(THREE, { kind: 'optical', fractions: [1, 1] })).toThrow(/expected 4 values/);
  });
});

describe('demo components (invented) match their nominal peak', () => {
  // Source: the analytic shapes put the λ-domain maximum at the nominal peak
  // (shapes/gaussianInEnergy.ts, dS/dλ = 0); allowance 1 nm = grid step [common practice].
  for (const p of DEMO_PHOSPHORS) {
    it(p.name, () => {
      const e = mix({ pump: THREE.pump, phosphors: [p] }, { kind: 'optical', fractions: [0, 1] }).evaluation;
      expect(Math.abs(e.peakNm - p.nominalPeakNm)).toBeLessThanOrEqual(1);
    });
  }
});
