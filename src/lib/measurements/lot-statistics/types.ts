/**
 * Lot statistics of a measured batch (plain JSON, shared by the page, the API and the batch record):
 * per-bin and per-verdict counts, process capability, the mean chromaticity with its confidence
 * ellipse and the trend over the run. Units: x, y CIE 1931 2°; Δu′v′ CIE 1976 UCS; CCT in K.
 */

/** A count and its share of the lot (0–1). */
export interface ShareCount {
  key: string;
  label: string;
  count: number;
  share: number;
}

/** Capability indices; null where a limit is missing or the spread is zero. */
export interface CapabilityIndices {
  cp: number | null;
  cpk: number | null;
  cpu: number | null;
  cpl: number | null;
}

export interface Capability extends CapabilityIndices {
  quantity: 'colour' | 'cct';
  /** What is measured, e.g. "Δu′v′ from target", "MacAdam steps from target", "CCT". */
  label: string;
  unit: string;
  n: number;
  mean: number;
  /** Sample standard deviation (n − 1) over the whole lot. */
  sd: number;
  lsl: number | null;
  usl: number | null;
  /** Where the limits come from, e.g. "revision tolerance Δu′v′ ≤ 0.003 (one-sided)". */
  limitSource: string;
}

/** Mean point of the lot and the confidence ellipse of the true mean (Hotelling's T²). */
export interface ConfidenceEllipse {
  n: number;
  level: number;
  mean: { x: number; y: number };
  /** Sample covariance (n − 1) of x and y. */
  covariance: { xx: number; xy: number; yy: number };
  /** F quantile F(2, n − 2) at `level`. */
  fQuantile: number;
  /** Semi-axes in CIE 1931 x,y units, major first; angle of the major axis from +x, degrees (−90…90]. */
  semiMajor: number;
  semiMinor: number;
  angleDeg: number;
  /** The target inside the ellipse: no evidence at this level that the lot mean is off target. */
  containsTarget: boolean | null;
}

export interface TrendGroup {
  /** First and last part index (0-based, in upload and column order). */
  first: number;
  last: number;
  n: number;
  mean: number;
  min: number;
  max: number;
  range: number;
}

export type TrendQuantity = 'deltaUvPrime' | 'cct' | 'x' | 'y';

export interface TrendSeries {
  quantity: TrendQuantity;
  label: string;
  unit: string;
  groups: TrendGroup[];
  /** Least-squares drift per 1,000 parts and its standard error; null with fewer than 3 parts. */
  slopePer1000: number | null;
  slopeSePer1000: number | null;
}

export interface LotStatistics {
  parts: number;
  bins: ShareCount[];
  verdicts: ShareCount[];
  capability: Capability[];
  ellipse: ConfidenceEllipse | null;
  trend: TrendSeries[];
}
