import { describe, expect, it } from 'vitest';
import { evaluateSpectrum, planckExitance, planckSpd, resampleToGrid, resampleToGridInto, GRID_LENGTH } from '../../src/lib/spectral/index';
import { planckSpdShared } from '../../src/lib/spectral/illuminants/planck';
import { partMetrics } from '../../src/lib/measurements/partMetrics';
import { bandsSpd } from './helpers';

// Buffers reused between calls must never leak one call's values into the next (common practice).

describe('Planckian SPD shared between the CIE 13.3 and CIE 224 references', () => {
  it('equals Planck’s law (CIE 15:2004 §3.1) for every temperature and span, whatever came before', () => {
    const calls: [number, number, number][] = [
      [3000, 20, 420],
      [3000, 0, GRID_LENGTH - 1],
      [3000, 20, 420],
      [4500, 20, 420],
      [4500, 0, GRID_LENGTH - 1],
      [2700, 0, GRID_LENGTH - 1]
    ];
    for (const [t, first, last] of calls) {
      const shared = planckSpdShared(t, first, last);
      const fresh = planckSpd(t);
      for (let i = first; i <= last; i++) expect(Math.abs(shared[i] - fresh[i]) / fresh[i]).toBeLessThan(1e-14);
      // planckSpd is c1·λ⁻⁵/(exp(c2/λT) − 1) scaled by 1e-13 (CIE 15:2004 §3.1)
      const i = Math.floor((first + last) / 2);
      expect(Math.abs(shared[i] / (1e-13 * planckExitance(360 + i, t)) - 1)).toBeLessThan(1e-12);
    }
  });
});

describe('resampling into a reused grid buffer', () => {
  it('gives the same grid as a fresh one, zero outside the measured range even after a wider spectrum', () => {
    const buffer = new Float64Array(GRID_LENGTH);
    const wide = { wavelengths: Array.from({ length: 471 }, (_, i) => 360 + i), values: Array.from({ length: 471 }, () => 1) };
    resampleToGridInto(wide, buffer);
    const narrow = bandsSpd([
      [450, 20, 1],
      [560, 100, 1.2]
    ]);
    const into = resampleToGridInto(narrow, buffer);
    expect(into).toBe(buffer);
    expect(Array.from(into)).toEqual(Array.from(resampleToGrid(narrow)));
    expect(into[0]).toBe(0); // 360 nm lies outside 380–780 nm: zero (rule of resample.ts, CIE 15:2004 §7.2 no extrapolation)
    expect(into[GRID_LENGTH - 1]).toBe(0);
  });

  it('part metrics from the reused buffer equal evaluateSpectrum of each part, in any order', () => {
    const parts = [
      bandsSpd([
        [450, 20, 1],
        [560, 110, 1.4],
        [630, 80, 1.2]
      ]),
      { wavelengths: Array.from({ length: 451 }, (_, i) => 370 + i), values: Array.from({ length: 451 }, (_, i) => 1 + i / 451) },
      bandsSpd([
        [445, 18, 1],
        [530, 40, 1.2],
        [631, 6, 0.4]
      ])
    ];
    for (const spd of [...parts, ...parts.reverse()]) {
      const m = partMetrics(spd);
      const e = evaluateSpectrum(spd);
      expect(m.cct).toBe(e.cct);
      expect(m.ra).toBe(e.cri.ra);
      expect(m.rf).toBe(e.tm30.rf);
      expect(m.rg).toBe(e.tm30.rg);
    }
  });
});
