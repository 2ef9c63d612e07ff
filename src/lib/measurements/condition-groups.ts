/**
 * Parts grouped by the condition their file was measured at (bench first, then each stated test
 * condition), and each group's measured mean against the prediction for that condition: measured
 * cold against predicted cold (the cold check of a hot-aimed revision) and, where hot measurements
 * exist, measured hot against predicted hot. Pure.
 */
import { describeCondition, isBenchCondition, type OperatingCondition } from '../aim/condition';

export interface ConditionGroup<P> {
  /** null = the bench (25 °C). */
  condition: OperatingCondition | null;
  label: string;
  parts: P[];
  /** Index of each part in the input. */
  indices: number[];
}

const keyOf = (c: OperatingCondition | null) =>
  !c || isBenchCondition(c) ? 'bench' : `${c.reference}:${c.temperatureC}:${c.driveCurrentMa ?? '-'}`;

export function groupByCondition<P extends { condition: OperatingCondition | null }>(parts: P[]): ConditionGroup<P>[] {
  const groups = new Map<string, ConditionGroup<P>>();
  parts.forEach((p, i) => {
    const k = keyOf(p.condition);
    let g = groups.get(k);
    if (!g) {
      const condition = k === 'bench' ? null : p.condition;
      g = { condition, label: describeCondition(condition), parts: [], indices: [] };
      groups.set(k, g);
    }
    g.parts.push(p);
    g.indices.push(i);
  });
  return [...groups.entries()].sort(([a], [b]) => (a === 'bench' ? -1 : b === 'bench' ? 1 : a.localeCompare(b))).map(([, g]) => g);
}

/** One row of "measured against predicted, by test condition". */
export interface ConditionCheck {
  label: string;
  /** What the parts are judged against, e.g. "the cold check target (revision aimed at Tj 85 °C)". */
  judgedAgainst: string;
  parts: number;
  passed: number;
  measured: { x: number; y: number } | null;
  predicted: { x: number; y: number } | null;
  /** MacAdam-type steps between the measured mean and the prediction. */
  steps: number | null;
  deltaUvPrime: number | null;
}
