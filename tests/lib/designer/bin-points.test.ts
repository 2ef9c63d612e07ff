/**
 * The blend on each chip bin: a bin centred on the pump's own peak gives the blend's own point, and a
 * longer-wavelength bin moves the point the way the loading model does when the pump is shifted
 * (`shiftPump`, the same model the recipe matrix corrects). Bins 2.5 nm wide (common practice).
 */
import { describe, expect, it } from 'vitest';
import { binPoints } from '../../../src/lib/designer/bin-points';
import { mix } from '../../../src/lib/blend';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { shiftPump } from '../../../src/lib/pump-bins/shift';
import { COMPONENTS } from '../../blend/thermal/fixtures';

const loading = { pathLengthMm: 0.3 };
const wt = [6, 2];
// The pump's own peak, as the bins state it.
const peak = prepareBasis({ pump: COMPONENTS.pump, phosphors: [] }).components[0].peakNm;

describe('binPoints', () => {
  it('a bin centred on the pump gives the blend itself; a shifted bin moves as the shifted pump does', () => {
    const own = mix(COMPONENTS, { kind: 'loading', concentrationsWtPct: wt, loading }).evaluation;
    const set = { basis: 'peak' as const, bins: [] as { code: string; fromNm: number; toNm: number; sharePct: number | null }[] };
    const centre = peak;
    set.bins.push({ code: 'B0', fromNm: centre - 1.25, toNm: centre + 1.25, sharePct: null });
    set.bins.push({ code: 'B1', fromNm: centre + 1.25, toNm: centre + 3.75, sharePct: null });
    const [b0, b1] = binPoints(COMPONENTS, set, { kind: 'loading', wtPct: wt, pathLengthMm: 0.3 }, { x: own.x, y: own.y, cct: own.cct });
    expect(b0.x).toBeCloseTo(own.x, 4);
    expect(b0.steps!).toBeLessThan(0.05);
    const shifted = mix(
      { ...COMPONENTS, pump: shiftPump(COMPONENTS.pump, 2.5) },
      { kind: 'loading', concentrationsWtPct: wt, loading }
    ).evaluation;
    expect(b1.x).toBeCloseTo(shifted.x, 4);
    expect(b1.y).toBeCloseTo(shifted.y, 4);
    expect(b1.steps!).toBeGreaterThan(0.1);
  });
});
