/**
 * Reference illuminant of CIE 13.3-1995 §5.2 [CIE13.3-1995] and its test-colour-sample
 * tristimulus values, CIE 1931 2° observer, 360–830 nm at 1 nm:
 *   CCT < 5000 K  → Planckian radiator at the CCT (CIE 15:2004 constants, `illuminants/planck.ts`)
 *   CCT ≥ 5000 K  → CIE daylight at the CCT (CIE 15:2004 eq. 3.3–3.5, `illuminants/daylight.ts`)
 * Daylight is linear in S0, S1, S2, so its sample sums are XYZ0 + M1·XYZ1 + M2·XYZ2 with the
 * three component sums precomputed once. Output sums are scaled so the illuminant has Y = 100.
 */
import { CMF_1931_2DEG } from '../colorimetry/cmf';
import { CIE_13_3_TCS } from '../data/cie-13-3-tcs';
import { DAYLIGHT_S0, DAYLIGHT_S1, DAYLIGHT_S2, daylightCoefficients } from '../illuminants/daylight';
import { planckSpdShared } from '../illuminants/planck';
import { knotWeights, makeKnotTable, newKnotWeights, sampleSums, type KnotTable } from '../internal/knot-integrals';

/** CIE 13.3 switches from Planckian to daylight reference at this CCT (K). */
export const CRI_DAYLIGHT_FROM_K = 5000;

export const TCS_TABLE: KnotTable = makeKnotTable(CIE_13_3_TCS.values, CIE_13_3_TCS.startNm, CIE_13_3_TCS.stepNm);
export const TCS_COUNT = TCS_TABLE.samples;

export interface SampleSet {
  /** White XYZ (Y = 100). */
  white: Float64Array;
  /** Sample XYZ, out[3i + c], on the same scale. */
  samples: Float64Array;
}

const weights = newKnotWeights(TCS_TABLE);

/** Sample XYZ of an arbitrary spectrum on the grid under CIE 1931 2° (white Y = 100). */
export function tcsUnder(spd: Float64Array, out: SampleSet = newSampleSet()): SampleSet {
  knotWeights(spd, CMF_1931_2DEG, TCS_TABLE, weights);
  const whiteRaw = weights.white;
  const k = 100 / whiteRaw[1];
  sampleSums(TCS_TABLE, weights, k, out.samples);
  out.white[0] = whiteRaw[0] * k;
  out.white[1] = 100;
  out.white[2] = whiteRaw[2] * k;
  return out;
}

export function newSampleSet(): SampleSet {
  return { white: new Float64Array(3), samples: new Float64Array(3 * TCS_COUNT) };
}

interface RawSet {
  white: Float64Array;
  samples: Float64Array;
}

let daylightParts: RawSet[] | null = null;

function rawUnder(spd: Float64Array): RawSet {
  const samples = new Float64Array(3 * TCS_COUNT);
  knotWeights(spd, CMF_1931_2DEG, TCS_TABLE, weights);
  sampleSums(TCS_TABLE, weights, 1, samples);
  return { white: Float64Array.from(weights.white), samples };
}

function daylightUnder(cctK: number, out: SampleSet): SampleSet {
  daylightParts ??= [rawUnder(DAYLIGHT_S0), rawUnder(DAYLIGHT_S1), rawUnder(DAYLIGHT_S2)];
  const [p0, p1, p2] = daylightParts;
  const { m1, m2 } = daylightCoefficients(cctK);
  const yw = p0.white[1] + m1 * p1.white[1] + m2 * p2.white[1];
  const k = 100 / yw;
  for (let c = 0; c < 3; c++) out.white[c] = k * (p0.white[c] + m1 * p1.white[c] + m2 * p2.white[c]);
  for (let i = 0; i < out.samples.length; i++) {
    out.samples[i] = k * (p0.samples[i] + m1 * p1.samples[i] + m2 * p2.samples[i]);
  }
  return out;
}

export type CriReference = 'planckian' | 'daylight';

export function criReferenceKind(cctK: number): CriReference {
  return cctK < CRI_DAYLIGHT_FROM_K ? 'planckian' : 'daylight';
}

/** CIE 13.3 §5.2: reference white and sample XYZ at the test CCT. */
export function criReferenceSamples(cctK: number, out: SampleSet = newSampleSet()): SampleSet {
  if (criReferenceKind(cctK) === 'daylight') return daylightUnder(cctK, out);
  return tcsUnder(planckSpdShared(cctK), out);
}
