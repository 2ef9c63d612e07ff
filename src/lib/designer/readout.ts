/**
 * What the readout panel says about a blend (pure): pass/fail of every floor, where the point
 * sits against the target (SDCM steps with the core's IEC 60081 ellipses, Δu′v′ per CIE 15:2004
 * §8.1) and which ANSI C78.377-2017 Table 1 bin holds it.
 * Ra and R9 are not meaningful when DC ≥ 5.4e-3 (CIE 13.3-1995 §5.3): such floors fail.
 */
import {
  colourDistance,
  FLOOR_RULES,
  withinTolerance,
  type FloorMetric,
  type Floors,
  type ResolvedTarget,
  type Tolerance
} from '../aim/index';
import { ansiBinOf, isInQuadrangle } from '../spectral/ansi/c78377';
import type { SpectrumEvaluation } from '../spectral/types';
import { cctMeaningful, shownMetrics, type ShownMetrics } from '../spectral/meaningful';
import { designIntents, type DesignIntentReport, type IntentLevel } from '../spectral/tm30/design-intents';

export interface FloorCheck {
  key: Exclude<keyof Floors, 'intent'>;
  label: string;
  /** '≥' for a minimum, '≤' for a maximum. */
  sense: '≥' | '≤';
  limit: number;
  value: number | null;
  pass: boolean;
  /** Why the value is missing, when it is. */
  note: string | null;
  /** Decimals to show the value with. */
  digits: number;
}

const METRIC_OF: Record<FloorMetric, (e: SpectrumEvaluation) => number> = {
  ra: (e) => e.cri.ra,
  r9: (e) => e.cri.ri[8],
  rf: (e) => e.tm30.rf,
  rg: (e) => e.tm30.rg,
  ler: (e) => e.ler,
  melDer: (e) => e.alphaOpic.der.melanopic
};

function metricValue(e: SpectrumEvaluation, metric: FloorMetric): number | null {
  const v = METRIC_OF[metric](e);
  return Number.isFinite(v) ? v : null;
}

export function floorChecks(floors: Floors, e: SpectrumEvaluation): FloorCheck[] {
  return FLOOR_RULES.filter((r) => floors[r.key] !== undefined).map((r) => {
    const limit = floors[r.key] as number;
    const criMetric = r.metric === 'ra' || r.metric === 'r9';
    // CIE 13.3 and TM-30 are judged together: neither where CIE 13.3 does not hold (../spectral/meaningful.ts).
    const renderingMetric = criMetric || r.metric === 'rf' || r.metric === 'rg';
    const rendering = e.cri.valid && cctMeaningful(e.cct, e.duv);
    const value = renderingMetric && !rendering ? null : metricValue(e, r.metric);
    const pass = value !== null && r.sense * (limit - value) <= 0;
    const note =
      value !== null
        ? null
        : renderingMetric
          ? 'not defined: too far from the Planckian locus (CIE 13.3 §5.3)'
          : 'not defined for this spectrum';
    return { key: r.key, label: r.label, sense: r.sense > 0 ? '≥' : '≤', limit, value, pass, note, digits: r.digits ?? 1 };
  });
}

export interface TargetStanding {
  /** MacAdam-type steps from the target. */
  steps: number;
  deltaUvPrime: number;
  withinTolerance: boolean;
  /** Nominal CCT of the Table 1 bin holding the point, or null. */
  ansiBin: number | null;
  /** Inside the target's own quadrangle (only for bin targets). */
  inTargetBin: boolean | null;
}

export function targetStanding(e: SpectrumEvaluation, target: ResolvedTarget, tolerance: Tolerance): TargetStanding {
  const err = colourDistance(e.x, e.y, target);
  return {
    steps: err.steps,
    deltaUvPrime: err.deltaUvPrime,
    withinTolerance: withinTolerance(err, tolerance),
    ansiBin: ansiBinOf(e.x, e.y),
    inTargetBin: target.ansiBin ? isInQuadrangle(e.x, e.y, target.ansiBin) : null
  };
}

export interface IntentStanding {
  /** Strictest level met per intent (null below level 3), or null when TM-30 is not meaningful here. */
  best: DesignIntentReport['best'] | null;
  /** The aim's required level, if any, with what it misses. */
  required: { level: IntentLevel; pass: boolean; misses: string[] } | null;
}

/** TM-30-20 Annex E levels the blend meets and the aim's required level (judged only where TM-30 means something). */
export function intentStanding(floors: Floors, e: SpectrumEvaluation): IntentStanding {
  const rendering = e.cri.valid && cctMeaningful(e.cct, e.duv);
  const report = rendering ? designIntents(e.tm30) : null;
  const level = floors.intent;
  const required = level
    ? report
      ? (() => {
          const c = report.checks.find((x) => x.level === level)!;
          return { level, pass: c.met, misses: c.misses };
        })()
      : { level, pass: false, misses: ['TM-30 not meaningful this far from white'] }
    : null;
  return { best: report?.best ?? null, required };
}

/** The figures of an evaluation that are meaningful to show (CIE 13.3-1995 §5.3 for Ra/R9, ANSI/IES TM-30-20 for Rf/Rg). */
export function shownFor(e: SpectrumEvaluation): ShownMetrics {
  return shownMetrics({ cct: e.cct, duv: e.duv, criValid: e.cri.valid, ra: e.cri.ra, r9: e.cri.ri[8], rf: e.tm30.rf, rg: e.tm30.rg });
}
