/** Which figures the designer shows for a computed light (readout and plot deck use the same rule). */
import { describe, expect, it } from 'vitest';
import { shownFor } from '../../../src/lib/designer/readout';
import { evaluateGrid } from '../../../src/lib/spectral/evaluate';
import { GRID_LENGTH, GRID_START_NM } from '../../../src/lib/spectral/grid';
import { planckSpd } from '../../../src/lib/spectral/illuminants/planck';

describe('shownFor', () => {
  it('shows every figure of a Planckian radiator at 2856 K, which renders like its own reference', () => {
    const s = shownFor(evaluateGrid(planckSpd(2856)));
    // CIE 15:2004 Table T.1: illuminant A (Planckian, 2856 K) is on the locus, Duv 0.
    expect(s.cct!).toBeCloseTo(2856, -1);
    expect(Math.abs(s.duv!)).toBeLessThan(0.0005);
    // CIE 13.3-1995 and ANSI/IES TM-30-20: a reference-equal source scores Ra = R9 = Rf = Rg = 100.
    expect(s.ra!).toBeCloseTo(100, 0);
    expect(s.r9!).toBeCloseTo(100, 0);
    expect(s.rf!).toBeCloseTo(100, 0);
    expect(s.rg!).toBeCloseTo(100, 0);
    expect(s.renderingNote).toBeNull();
  });

  it('hides CCT and every rendering figure of a blue pump alone', () => {
    // A narrow band at 450 nm is far from white: |Duv| > 0.05 (common practice) and DC ≥ 5.4e-3 (CIE 13.3-1995 §5.3).
    const grid = new Float64Array(GRID_LENGTH);
    for (let i = 0; i < GRID_LENGTH; i++) grid[i] = Math.exp(-0.5 * ((GRID_START_NM + i - 450) / 9) ** 2);
    const s = shownFor(evaluateGrid(grid));
    expect([s.cct, s.duv, s.ra, s.r9, s.rf, s.rg]).toEqual([null, null, null, null, null, null]);
  });
});
