import { describe, expect, it } from 'vitest';
import { evaluateSpectrum } from '../../src/lib/spectral/index';
import { CIE_ILLUMINANTS_F, CIE_ILLUMINANT_A } from '../../src/lib/spectral/data/cie-illuminants';
import { CIE_D65 } from '../../src/lib/spectral/data/cie-d65';
import { tableSpd } from './helpers';

// Expected values as printed in the published tables named below.
// x,y: CIE 15:2004 table of F-illuminant chromaticities (4 decimals) and standard illuminant white
// points (5 decimals, from memory). CCT (10 K) and Ra (integer) of F1–F12: nominal table values of
// CIE 15:2004, FROM MEMORY. Tolerances: half a unit of the last printed digit plus a method
// allowance. The core integrates at 1 nm (5 nm tables linearly interpolated), the printed values
// come from 5 nm sums; for line spectra (F) this moves y by up to +0.00023 (5 nm sums reproduce the
// printed x,y to ±0.00005), so xy allowance = 0.00025; CCT allowance 5 K.
type Row = [name: string, x: number, y: number, cctK: number, ra: number | null];
const published: Row[] = [
  ['F1', 0.3131, 0.3371, 6430, 76],
  ['F2', 0.3721, 0.3751, 4230, 64],
  ['F3', 0.4091, 0.3941, 3450, 57],
  ['F4', 0.4402, 0.4031, 2940, 51],
  ['F5', 0.3138, 0.3452, 6350, 72],
  ['F6', 0.3779, 0.3882, 4150, 59],
  ['F7', 0.3129, 0.3292, 6500, 90],
  ['F8', 0.3458, 0.3586, 5000, 95],
  ['F9', 0.3741, 0.3727, 4150, 90],
  ['F10', 0.3458, 0.3588, 5000, 81],
  ['F11', 0.3805, 0.3769, 4000, 83],
  ['F12', 0.437, 0.4042, 3000, 83],
  ['D65', 0.31272, 0.32903, 6504, 100], // Ra = 100: D65 is its own reference (CIE 13.3)
  ['A', 0.44757, 0.40745, 2856, 100] // Ra = 100: A is a Planckian radiator (CIE 13.3)
];

const series: Record<string, readonly number[]> = CIE_ILLUMINANTS_F.series;
const cases = published.map(([name, x, y, cctK, ra]) => ({
  name,
  input:
    name === 'A'
      ? tableSpd(CIE_ILLUMINANT_A.values, CIE_ILLUMINANT_A.startNm, CIE_ILLUMINANT_A.stepNm)
      : name === 'D65'
        ? tableSpd(CIE_D65.values, CIE_D65.startNm, CIE_D65.stepNm)
        : tableSpd(series[name], CIE_ILLUMINANTS_F.startNm, CIE_ILLUMINANTS_F.stepNm),
  expected: { x, y, cctK, ra },
  tol: {
    xy: (name.startsWith('F') ? 0.00005 : 0.000005) + 0.00025,
    cctK: 10 + 5,
    // Ra: ±0.5 (integer table) + 0.1 method allowance (1 nm vs 5 nm sums move Ra by ≤ 0.1; with
    // 5 nm sums F4 gives 51.43, at 1 nm 51.52). F8 sits at 4995 K (computed), just below the 5000 K
    // switch, so CIE 13.3 takes a Planckian reference: Ra = 95.54; with a daylight reference
    // (nominal 5000 K) it is 95.18, which the integer table value 95 seems to reflect.
    ra: 0.6
  },
  source: 'CIE 15:2004 (x,y printed; CCT, Ra from memory)'
}));

describe('CIE 15:2004 illuminants F1–F12, A, D65', () => {
  it.each(cases)('$name', ({ input, expected, tol }) => {
    const e = evaluateSpectrum(input);
    expect(Math.abs(e.x - expected.x)).toBeLessThanOrEqual(tol.xy);
    expect(Math.abs(e.y - expected.y)).toBeLessThanOrEqual(tol.xy);
    expect(Math.abs(e.cct - expected.cctK)).toBeLessThanOrEqual(tol.cctK);
    if (expected.ra !== null) expect(Math.abs(e.cri.ra - expected.ra)).toBeLessThanOrEqual(tol.ra);
  });
});
