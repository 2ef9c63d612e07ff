/**
 * The lot statistics of a judged batch: counts per ANSI bin and verdict (counts.ts), capability (lot-capability.ts),
 * the mean chromaticity with its 95 % Hotelling T² confidence ellipse (confidence-ellipse.ts) and the trend of
 * Δu′v′ from target, CCT, x and y over the run (trend.ts). Parts in the order given (upload, then column).
 */
import type { ResolvedTarget, Tolerance } from '../../aim/index';
import type { JudgedPart } from '../types';
import { meanConfidenceEllipse } from './confidence-ellipse';
import { binShares, verdictShares } from './counts';
import { lotCapability } from './lot-capability';
import { consecutiveGroups, driftSlope, groupStatistics } from './trend';
import type { LotStatistics, TrendQuantity, TrendSeries } from './types';

export const ELLIPSE_LEVEL = 0.95;

const TREND: { quantity: TrendQuantity; label: string; unit: string; of: (p: JudgedPart) => number }[] = [
  { quantity: 'deltaUvPrime', label: 'Δu′v′ from target', unit: '', of: (p) => p.verdict.offset.deltaUvPrime },
  { quantity: 'cct', label: 'CCT', unit: 'K', of: (p) => p.metrics.cct },
  { quantity: 'x', label: 'x', unit: '', of: (p) => p.metrics.x },
  { quantity: 'y', label: 'y', unit: '', of: (p) => p.metrics.y }
];

/** Run-chart groups and least-squares drift per 1,000 parts of one quantity. */
// Montgomery (2013) §6.2 (x̄ and R of consecutive groups); Montgomery & Runger (2014) §11-4.1 (slope and its standard error).
export function trendSeries(values: readonly (number | null)[], quantity: TrendQuantity, label: string, unit: string): TrendSeries {
  const drift = driftSlope(values);
  return {
    quantity,
    label,
    unit,
    groups: groupStatistics(values, consecutiveGroups(values.length)),
    slopePer1000: drift ? drift.slope * 1000 : null,
    slopeSePer1000: drift ? drift.se * 1000 : null
  };
}

/** Lot statistics, or null for a lot without parts. */
// Composition of the methods cited in counts.ts, capability.ts, confidence-ellipse.ts and trend.ts.
export function lotStatistics(parts: readonly JudgedPart[], target: ResolvedTarget, tolerance: Tolerance): LotStatistics | null {
  if (!parts.length) return null;
  return {
    parts: parts.length,
    bins: binShares(parts),
    verdicts: verdictShares(parts),
    capability: lotCapability(parts, target, tolerance),
    ellipse: meanConfidenceEllipse(
      parts.map((p) => ({ x: p.metrics.x, y: p.metrics.y })),
      ELLIPSE_LEVEL,
      target
    ),
    trend: TREND.map((t) => trendSeries(parts.map(t.of), t.quantity, t.label, t.unit))
  };
}
