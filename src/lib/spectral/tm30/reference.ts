/**
 * Reference illuminant of CIE 224:2017 §4.3 [CIE224-2017] / ANSI/IES TM-30-20 §4 [IES-TM30-20]:
 *   T ≤ 4000 K: Planckian; T ≥ 5000 K: CIE daylight (CIE 15:2004 eq. 3.3–3.5);
 *   4000 K < T < 5000 K: S_r = (1 − m)·P/Y_P + m·D/Y_D with m = (T − 4000 K)/1000 K,
 *   each component normalised to equal Y10 (CIE 1964 10°, 380–780 nm) before mixing.
 * Also gives the 99 CES tristimulus values under that reference (10° observer, 380–780 nm,
 * 1 nm, CES linearly interpolated from 5 nm); daylight via precomputed S0/S1/S2 sums.
 * Units: T in K; XYZ scaled so the reference white has Y10 = 100.
 */
import { CMF_1964_10DEG } from '../colorimetry/cmf';
import { TM30_CES99 } from '../data/tm30-ces99';
import { GRID_LENGTH } from '../grid';
import { DAYLIGHT_S0, DAYLIGHT_S1, DAYLIGHT_S2, daylightCoefficients, daylightSpd } from '../illuminants/daylight';
import { planckSpd, planckSpdShared } from '../illuminants/planck';
import { knotSpan, knotWeights, makeKnotTable, newKnotWeights, sampleSums, type KnotTable } from '../internal/knot-integrals';

export const CES_TABLE: KnotTable = makeKnotTable(TM30_CES99.values, TM30_CES99.startNm, TM30_CES99.stepNm);
export const CES_COUNT = CES_TABLE.samples;
export const BLEND_START_K = 4000;
export const BLEND_END_K = 5000;
const [SPAN_FIRST, SPAN_LAST] = knotSpan(CES_TABLE);

export interface CesSet {
  white: Float64Array;
  samples: Float64Array;
}

export function newCesSet(): CesSet {
  return { white: new Float64Array(3), samples: new Float64Array(3 * CES_COUNT) };
}

const weights = newKnotWeights(CES_TABLE);

/** CES sums of a spectrum on the grid, CIE 1964 10°, 380–780 nm, scaled so the white has Y = whiteY (null: raw). */
function cesUnderScaled(spd: Float64Array, out: CesSet, whiteY: number | null): CesSet {
  knotWeights(spd, CMF_1964_10DEG, CES_TABLE, weights);
  const k = whiteY === null ? 1 : whiteY / weights.white[1];
  for (let c = 0; c < 3; c++) out.white[c] = weights.white[c] * k;
  sampleSums(CES_TABLE, weights, k, out.samples);
  return out;
}

/** Raw (unscaled) CES sums of a spectrum on the grid, CIE 1964 10°, 380–780 nm. */
export function cesUnderRaw(spd: Float64Array, out: CesSet = newCesSet()): CesSet {
  return cesUnderScaled(spd, out, null);
}

/** CES sums of a spectrum on the grid, CIE 1964 10°, 380–780 nm, scaled so its white has Y = 100. */
export function cesUnder(spd: Float64Array, out: CesSet = newCesSet()): CesSet {
  return cesUnderScaled(spd, out, 100);
}

/** Scales a set so its white has Y = 100. */
export function scaleToWhite100(set: CesSet): CesSet {
  const k = 100 / set.white[1];
  for (let c = 0; c < 3; c++) set.white[c] *= k;
  for (let i = 0; i < set.samples.length; i++) set.samples[i] *= k;
  return set;
}

let parts: CesSet[] | null = null;

/** Adds the daylight (S0 + M1·S1 + M2·S2) CES sums to `out` when `add` (else writes them), scaled so its white has Y = whiteY. */
function daylightInto(cctK: number, out: CesSet, whiteY: number, add: boolean): CesSet {
  parts ??= [cesUnderRaw(DAYLIGHT_S0), cesUnderRaw(DAYLIGHT_S1), cesUnderRaw(DAYLIGHT_S2)];
  const [p0, p1, p2] = parts;
  const { m1, m2 } = daylightCoefficients(cctK);
  const k = whiteY / (p0.white[1] + m1 * p1.white[1] + m2 * p2.white[1]);
  const a = add ? 1 : 0;
  for (let c = 0; c < 3; c++) out.white[c] = a * out.white[c] + k * (p0.white[c] + m1 * p1.white[c] + m2 * p2.white[c]);
  const s = out.samples;
  const s0 = p0.samples;
  const s1 = p1.samples;
  const s2 = p2.samples;
  for (let i = 0; i < s.length; i++) s[i] = a * s[i] + k * (s0[i] + m1 * s1[i] + m2 * s2[i]);
  return out;
}

/** Blend weight m of daylight (0 = Planckian only, 1 = daylight only). */
export function daylightFraction(cctK: number): number {
  if (cctK <= BLEND_START_K) return 0;
  if (cctK >= BLEND_END_K) return 1;
  return (cctK - BLEND_START_K) / (BLEND_END_K - BLEND_START_K);
}

/** CIE 224 reference: white and CES XYZ (white Y10 = 100). */
export function tm30ReferenceSamples(cctK: number, out: CesSet = newCesSet()): CesSet {
  const m = daylightFraction(cctK);
  if (m === 1) return daylightInto(cctK, out, 100, false);
  const planck = planckSpdShared(cctK, SPAN_FIRST, SPAN_LAST);
  if (m === 0) return cesUnder(planck, out);
  // §4.3: (1 − m)·P/Y_P + m·D/Y_D has Y10 = 1; ×100 gives the white Y10 = 100.
  cesUnderScaled(planck, out, 100 * (1 - m));
  return daylightInto(cctK, out, 100 * m, true);
}

function y10(spd: Float64Array): number {
  let y = 0;
  for (let i = 20; i <= 420; i++) y += spd[i] * CMF_1964_10DEG.yBar[i]; // 380–780 nm
  return y;
}

/** CIE 224 reference SPD on the working grid (for plots and tests), scaled to Y10 = 1. */
export function tm30ReferenceSpd(cctK: number): Float64Array {
  const m = daylightFraction(cctK);
  const p = planckSpd(cctK);
  const d = daylightSpd(cctK);
  const yp = y10(p);
  const yd = y10(d);
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = ((1 - m) * p[i]) / yp + (m * d[i]) / yd;
  return out;
}
