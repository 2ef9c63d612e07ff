/**
 * One rule for which figures a page shows. Limits: |Duv| ≤ 0.05 and 1000–20 000 K for CCT (CIE 15:2004
 * §9.5 note; the 0.05 figure is common practice); CIE 13.3 and TM-30 shown or hidden together.
 */
import { describe, expect, it } from 'vitest';
import { cctMeaningful, shownMetrics } from '../../src/lib/spectral/meaningful';
import { evaluateGrid } from '../../src/lib/spectral/evaluate';
import { GRID_LENGTH, GRID_START_NM } from '../../src/lib/spectral/grid';

describe('meaningful figures', () => {
  it('hides "CCT 20025 K, Duv −0.2356" and Rf/Rg 35.8/134.4 together with Ra/R9 (the daily-use trial)', () => {
    const s = shownMetrics({ cct: 20025, duv: -0.2356, criValid: false, ra: null, r9: null, rf: 35.8, rg: 134.4 });
    expect([s.cct, s.duv, s.ra, s.r9, s.rf, s.rg]).toEqual([null, null, null, null, null, null]);
    expect(s.colourNote).toMatch(/not meaningful/);
    expect(s.renderingNote).toMatch(/Rf, Rg/);
  });

  it('shows a white point near the locus in full', () => {
    const s = shownMetrics({ cct: 3000, duv: 0.001, criValid: true, ra: 92.7, r9: 51, rf: 90.1, rg: 101.2 });
    expect(s).toMatchObject({ cct: 3000, duv: 0.001, ra: 92.7, r9: 51, rf: 90.1, rg: 101.2, colourNote: null, renderingNote: null });
  });

  it('draws the edges at |Duv| = 0.05 and 1000 / 20 000 K inclusive', () => {
    expect(cctMeaningful(20000, 0.05)).toBe(true);
    expect(cctMeaningful(20001, 0)).toBe(false);
    expect(cctMeaningful(999, 0)).toBe(false);
    expect(cctMeaningful(4000, -0.0501)).toBe(false);
  });

  it('hides the rendering figures of a saturated blue light, where CIE 13.3 does not hold', () => {
    // A narrow band at 450 nm (a blue pump alone) is far from white: DC ≥ 5.4e-3 (CIE 13.3 §5.3).
    const grid = new Float64Array(GRID_LENGTH);
    for (let i = 0; i < GRID_LENGTH; i++) grid[i] = Math.exp(-0.5 * ((GRID_START_NM + i - 450) / 9) ** 2);
    const e = evaluateGrid(grid);
    const s = shownMetrics({ cct: e.cct, duv: e.duv, criValid: e.cri.valid, ra: e.cri.ra, r9: e.cri.ri[8], rf: e.tm30.rf, rg: e.tm30.rg });
    expect(s.ra).toBeNull();
    expect(s.rf).toBeNull();
    expect(s.rg).toBeNull();
  });
});
