/**
 * Shared domain types of the spectral core. Plain data only, so results
 * cross the server/browser boundary as JSON.
 */

/** A relative spectral power distribution on an increasing wavelength grid (nm). */
export interface Spd {
  wavelengths: number[];
  values: number[];
}

export interface CriResult {
  /** General colour rendering index, mean of R1..R8 (CIE 13.3-1995). */
  ra: number;
  /** Special indices R1..R14. */
  ri: number[];
  /** Distance of test and reference source in CIE 1960 u,v (CIE 13.3 §5.3). */
  dc: number;
  /** false when dc ≥ 5.4e-3: Ra is then not meaningful. */
  valid: boolean;
  /** Reference illuminant used: 'planckian' or 'daylight'. */
  reference: 'planckian' | 'daylight';
}

export interface Tm30Bin {
  rf: number;
  /** Local chroma shift, as a fraction (−0.07 = −7 %). */
  rcs: number;
  /** Local hue shift, radians. */
  rhs: number;
  /** Mean test and reference a',b' of the bin (for the colour-vector graphic). */
  testAB: [number, number];
  refAB: [number, number];
}

export interface Tm30Result {
  rf: number;
  rg: number;
  bins: Tm30Bin[];
}

/** One value per α-opic quantity of CIE S 026/E:2018 (s-cone, m-cone, l-cone, rhodopic, melanopic). */
export interface AlphaOpicValues {
  sCone: number;
  mCone: number;
  lCone: number;
  rhodopic: number;
  melanopic: number;
}

export interface AlphaOpicResult {
  /** α-opic efficacy of luminous radiation K_α,v, mW/lm (CIE S 026/E:2018). */
  efficacyMwPerLm: AlphaOpicValues;
  /** α-opic daylight (D65) efficacy ratio γ_α,v^D65, dimensionless; 1 for D65. */
  der: AlphaOpicValues;
  /** Melanopic equivalent daylight (D65) illuminance of 1,000 lx of this light, lx (= 1000 × melanopic DER). */
  melanopicEdiPer1000Lx: number;
}

export interface SpectrumEvaluation {
  XYZ: [number, number, number];
  x: number;
  y: number;
  u: number;
  v: number;
  uPrime: number;
  vPrime: number;
  cct: number;
  duv: number;
  cri: CriResult;
  tm30: Tm30Result;
  ler: number;
  /** Non-visual (ipRGC-influenced) metrics, CIE S 026/E:2018. */
  alphaOpic: AlphaOpicResult;
  peakNm: number;
  centroidNm: number;
  fwhmNm: number;
}

/** Options of `evaluateSpectrum`: skip the slower metrics on live/solver paths. */
export interface EvaluateOptions {
  /** Compute CIE 13.3 CRI (default true). */
  cri?: boolean;
  /** Compute TM-30 / CIE 224 (default true). */
  tm30?: boolean;
}

/** Result when CRI or TM-30 may have been skipped: skipped parts are null. */
export type PartialSpectrumEvaluation = Omit<SpectrumEvaluation, 'cri' | 'tm30'> & {
  cri: CriResult | null;
  tm30: Tm30Result | null;
};
