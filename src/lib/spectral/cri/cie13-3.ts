/**
 * Colour rendering index, CIE 13.3-1995 "Method of Measuring and Specifying Colour Rendering
 * Properties of Light Sources" [CIE13.3-1995]: special indices R1–R14 and general index Ra.
 * Steps (section numbers of CIE 13.3-1995):
 *  §5.2 reference illuminant at the test CCT (`reference.ts`); §5.3 DC = distance of test and
 *  reference in CIE 1960 u,v, Ra meaningful only when DC < 5.4e−3; §5.4 von Kries-type
 *  adaptation in the c,d plane; §5.5 CIE 1964 U*V*W*; §5.6 ΔE_i; R_i = 100 − 4.6 ΔE_i (eq. 5);
 *  Ra = mean(R1..R8) (eq. 6).
 * Deviation: integration over 360–830 nm at 1 nm (TCS linearly interpolated from 5 nm) instead
 * of 380–780 nm at 5 nm; CCT by Ohno 2014 (within 1 K of the CIE 15 definition).
 * Input: SPD on the working grid (any scale) and its CCT in K. Outputs unrounded.
 */
import { newSampleSet, tcsUnder, criReferenceKind, criReferenceSamples, TCS_COUNT } from './reference';
import type { CriResult } from '../types';

/** CIE 13.3 §5.3: tolerance on DC. */
export const CRI_DC_LIMIT = 5.4e-3;

const test = newSampleSet();
const ref = newSampleSet();

function uvOf(X: number, Y: number, Z: number): [number, number] {
  const d = X + 15 * Y + 3 * Z; // CIE 1960 UCS
  return [(4 * X) / d, (6 * Y) / d];
}

// CIE 13.3 eq. 3: c = (4 − u − 10v)/v, d = (1.708v + 0.404 − 1.481u)/v
const cOf = (u: number, v: number): number => (4 - u - 10 * v) / v;
const dOf = (u: number, v: number): number => (1.708 * v + 0.404 - 1.481 * u) / v;

export function criCie133(spd: Float64Array, cctK: number): CriResult {
  tcsUnder(spd, test);
  criReferenceSamples(cctK, ref);
  const [uk, vk] = uvOf(test.white[0], test.white[1], test.white[2]);
  const [ur, vr] = uvOf(ref.white[0], ref.white[1], ref.white[2]);
  const dc = Math.hypot(uk - ur, vk - vr); // CIE 13.3 §5.3
  const ck = cOf(uk, vk);
  const dk = dOf(uk, vk);
  const cr = cOf(ur, vr);
  const dr = dOf(ur, vr);
  const cRatio = cr / ck;
  const dRatio = dr / dk;

  const ri: number[] = new Array<number>(TCS_COUNT);
  for (let i = 0; i < TCS_COUNT; i++) {
    const o = 3 * i;
    const [uki, vki] = uvOf(test.samples[o], test.samples[o + 1], test.samples[o + 2]);
    const cki = cOf(uki, vki);
    const dki = dOf(uki, vki);
    // CIE 13.3 eq. 4: adapted test sample chromaticity
    const den = 16.518 + 1.481 * cRatio * cki - dRatio * dki;
    const ua = (10.872 + 0.404 * cRatio * cki - 4 * dRatio * dki) / den;
    const va = 5.52 / den;
    // CIE 13.3 eq. 5 (CIE 1964 U*V*W*); the adapted test white is (ur, vr).
    const wk = 25 * Math.cbrt(test.samples[o + 1]) - 17;
    const uStarK = 13 * wk * (ua - ur);
    const vStarK = 13 * wk * (va - vr);
    const [uri, vri] = uvOf(ref.samples[o], ref.samples[o + 1], ref.samples[o + 2]);
    const wr = 25 * Math.cbrt(ref.samples[o + 1]) - 17;
    const uStarR = 13 * wr * (uri - ur);
    const vStarR = 13 * wr * (vri - vr);
    const dE = Math.hypot(uStarR - uStarK, vStarR - vStarK, wr - wk); // §5.6
    ri[i] = 100 - 4.6 * dE; // CIE 13.3 eq. 5
  }
  let sum = 0;
  for (let i = 0; i < 8; i++) sum += ri[i];
  return {
    ra: sum / 8, // CIE 13.3 eq. 6
    ri,
    dc,
    valid: dc < CRI_DC_LIMIT,
    reference: criReferenceKind(cctK)
  };
}
