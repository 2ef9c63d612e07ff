/**
 * Batch summary of judged parts: mean and spread (statistics.ts) of x, y, CCT, Duv, Ra, R9,
 * Rf, Rg, LER and melanopic DER (CIE S 026/E:2018; parts measured before it are left out); yield =
 * share of parts passing; the mean chromaticity with its CCT/Duv and its offset from the target;
 * distribution over ANSI C78.377 Table 1 bins; failure counts by reason; histogram data of CCT and Ra.
 */
import { colourDistance, type ColourDistance, type ResolvedTarget } from '../aim/index';
import { histogram } from './histogram';
import { colourPoint, type ColourPoint } from './prediction';
import { describe } from './statistics';
import {
  SUMMARY_QUANTITIES,
  type FailureCode,
  type HistogramBin,
  type JudgedPart,
  type PartMetrics,
  type Stat,
  type SummaryQuantity
} from './types';

export interface BatchSummary {
  parts: number;
  passed: number;
  /** passed / parts, 0–1; null without parts. */
  yieldFraction: number | null;
  stats: Record<SummaryQuantity, Stat | null>;
  /** Mean x,y of the parts and the CCT/Duv of that point. */
  meanPoint: ColourPoint | null;
  /** Mean point − target. */
  meanOffset: ColourDistance | null;
  /** Parts per ANSI Table 1 bin (null = in no bin), in rising CCT, no-bin last. */
  bins: { nominalCct: number | null; count: number }[];
  /** Parts inside the target quadrangle; null when the target has no bin. */
  inTargetBin: number | null;
  failures: { code: FailureCode; count: number }[];
  histograms: { cct: HistogramBin[]; ra: HistogramBin[] };
}

function quantityOf(m: PartMetrics, q: SummaryQuantity): number | null {
  return q === 'melDer' ? (m.alphaOpic?.der.melanopic ?? null) : m[q];
}

export function summariseBatch(parts: readonly JudgedPart[], target: ResolvedTarget): BatchSummary {
  const stats = Object.fromEntries(SUMMARY_QUANTITIES.map((q) => [q, describe(parts.map((p) => quantityOf(p.metrics, q)))])) as Record<
    SummaryQuantity,
    Stat | null
  >;
  const passed = parts.filter((p) => p.verdict.pass).length;
  const meanPoint = stats.x && stats.y ? colourPoint(stats.x.mean, stats.y.mean) : null;

  const binCounts = new Map<number | null, number>();
  const failureCounts = new Map<FailureCode, number>();
  let inTarget = 0;
  for (const p of parts) {
    binCounts.set(p.verdict.ansiBin, (binCounts.get(p.verdict.ansiBin) ?? 0) + 1);
    if (p.verdict.inTargetBin) inTarget++;
    const failures = p.verdict.failures;
    if (failures.length === 0) continue; // most parts pass: no set to build
    for (const code of new Set(failures.map((f) => f.code))) failureCounts.set(code, (failureCounts.get(code) ?? 0) + 1);
  }
  const bins = [...binCounts.entries()]
    .map(([nominalCct, count]) => ({ nominalCct, count }))
    .sort((a, b) => (a.nominalCct ?? Infinity) - (b.nominalCct ?? Infinity));

  return {
    parts: parts.length,
    passed,
    yieldFraction: parts.length ? passed / parts.length : null,
    stats,
    meanPoint,
    meanOffset: meanPoint ? colourDistance(meanPoint.x, meanPoint.y, target) : null,
    bins,
    inTargetBin: target.ansiBin ? inTarget : null,
    failures: [...failureCounts.entries()].map(([code, count]) => ({ code, count })).sort((a, b) => b.count - a.count),
    histograms: {
      cct: histogram(parts.map((p) => p.metrics.cct)),
      ra: histogram(parts.map((p) => p.metrics.ra))
    }
  };
}
