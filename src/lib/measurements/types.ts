/**
 * Shared types of the quality feature (pure data, JSON-safe): what is measured on one built
 * part, how it is judged against a formulation revision, and what a batch summary holds.
 * Units: x, y CIE 1931 2°; u′, v′ CIE 1976 UCS; CCT in K; Duv in CIE 1960 uv; LER in lm/W.
 */
import type { ColourDistance, Floors, Tolerance } from '../aim/index';
import type { AlphaOpicResult } from '../spectral/types';

/** Everything the spectral core says about one measured part. */
export interface PartMetrics {
  x: number;
  y: number;
  uPrime: number;
  vPrime: number;
  cct: number;
  duv: number;
  /** CIE 13.3 Ra and R9; null when the core could not compute them. */
  ra: number | null;
  r9: number | null;
  /** R1..R14. */
  ri: (number | null)[];
  /** false when the source is too far from the locus for CRI to mean anything (DC ≥ 5.4e-3). */
  criValid: boolean;
  /** CIE 224 / TM-30 fidelity and gamut; null when not finite (far from white). */
  rf: number | null;
  rg: number | null;
  /** TM-30 hue bin 1 local indices (Rf,h1; Rcs,h1 as a fraction), for the Annex E design intents; absent on older parts. */
  rfh1?: number | null;
  rcsh1?: number | null;
  /** null for a part read from a tester table (it needs the spectrum). */
  ler: number | null;
  /** α-opic efficacies, DERs and melanopic EDI per 1,000 lx (CIE S 026/E:2018); absent on older parts. */
  alphaOpic?: AlphaOpicResult;
  /** Spectral shape; null for a part read from a tester table (its peak when the tester reports it). */
  peakNm: number | null;
  fwhmNm: number | null;
  centroidNm: number | null;
  /** Where the metrics come from: a measured spectrum (absent on older parts), or a tester's per-part table. */
  source?: 'spectrum' | 'table';
  /** What a tester table carries besides colour: luminous flux (lm), forward voltage (V), its own bin label. */
  fluxLm?: number | null;
  forwardVoltageV?: number | null;
  testerBin?: string | null;
}

/** A part's identity plus its metrics. */
export interface MeasuredPart {
  label: string;
  metrics: PartMetrics;
}

/** How parts are judged: colour tolerance around the target, the revision's floors, and the bin rule. */
export interface Acceptance {
  tolerance: Tolerance;
  floors: Floors;
  /** The part must lie inside the target's ANSI C78.377 quadrangle. */
  requireTargetBin: boolean;
}

/** What a failure is about: the colour tolerance, the target bin, or one floor (blend floor keys). */
export type FailureCode = 'colour' | 'bin' | keyof Floors;

export interface PartFailure {
  code: FailureCode;
  message: string;
}

export interface PartVerdict {
  pass: boolean;
  /** Reasons for a fail (code + readable message, e.g. "Ra 78.4 < 80"). Empty when the part passes. */
  failures: PartFailure[];
  /** Nominal CCT of the ANSI C78.377 Table 1 bin the part falls in; null = in no nominal bin. */
  ansiBin: number | null;
  /** Inside the target's own quadrangle (Table 1 or flexible); null when the target has no bin. */
  inTargetBin: boolean | null;
  /** Where the part sits relative to the target (MacAdam-type steps at the target CCT). */
  offset: ColourDistance;
  /** Floors not judged because the part's tester table does not carry the metric ("Ra ≥ 90: not measured"). */
  notMeasured?: string[];
}

export interface JudgedPart extends MeasuredPart {
  verdict: PartVerdict;
}

/** Descriptive statistics of one quantity over the parts that have it. */
export interface Stat {
  n: number;
  mean: number;
  /** Sample standard deviation (n − 1); 0 for a single part. */
  sd: number;
  min: number;
  max: number;
}

/** Summarised quantities; melDer = melanopic DER (CIE S 026/E:2018), from `PartMetrics.alphaOpic`. */
export const SUMMARY_QUANTITIES = ['x', 'y', 'cct', 'duv', 'ra', 'r9', 'rf', 'rg', 'ler', 'melDer'] as const;
export type SummaryQuantity = (typeof SUMMARY_QUANTITIES)[number];

export interface HistogramBin {
  x0: number;
  x1: number;
  count: number;
}
