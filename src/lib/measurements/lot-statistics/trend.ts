/**
 * Trend of a quantity over the run, by part index (upload order, then column order):
 *  - the lot in consecutive groups (at most 50, at least 2 parts each where the lot allows; sizes differ
 *    by at most one), each with its mean and range (max − min) — the x̄ and R of a run chart
 *    (Montgomery, Introduction to Statistical Quality Control, 7th ed. (2013), §6.2);
 *  - the least-squares slope of the quantity against part index and its standard error
 *    se(β̂₁) = √(σ̂²/Sxx), σ̂² = SSE/(n − 2) (Montgomery & Runger, Applied Statistics and Probability
 *    for Engineers, 6th ed. (2014), §11-2 and §11-4.1), given per 1,000 parts.
 * Missing values (null, non-finite) are left out but keep their index.
 */
import type { TrendGroup } from './types';

export const MAX_TREND_GROUPS = 50;

/** Index ranges [first, last] of consecutive groups covering 0…n − 1. */
// common practice (run chart subgroups of consecutive production): g = min(50, ⌊n/2⌋) groups, boundaries ⌊i·n/g⌋.
export function consecutiveGroups(n: number, maxGroups = MAX_TREND_GROUPS): [number, number][] {
  if (n <= 0) return [];
  const g = Math.max(1, Math.min(maxGroups, Math.floor(n / 2)));
  return Array.from({ length: g }, (_, i): [number, number] => [Math.floor((i * n) / g), Math.floor(((i + 1) * n) / g) - 1]);
}

const finite = (v: number | null): v is number => v !== null && Number.isFinite(v);

/** Mean, minimum, maximum and range of each group; groups without a value are left out. */
// Montgomery (2013) §6.2: subgroup mean x̄ and range R = max − min.
export function groupStatistics(values: readonly (number | null)[], groups: readonly [number, number][]): TrendGroup[] {
  const out: TrendGroup[] = [];
  for (const [first, last] of groups) {
    let n = 0;
    let sum = 0;
    let min = Infinity;
    let max = -Infinity;
    for (let i = first; i <= last; i++) {
      const v = values[i];
      if (!finite(v)) continue;
      n++;
      sum += v;
      if (v < min) min = v;
      if (v > max) max = v;
    }
    if (n) out.push({ first, last, n, mean: sum / n, min, max, range: max - min });
  }
  return out;
}

/** Least-squares slope of value against index, per part, with its standard error; null below 3 values. */
// Montgomery & Runger (2014) eq. 11-7, 11-8 and §11-4.1: β̂₁ = Sxy/Sxx, se(β̂₁) = √(σ̂²/Sxx), σ̂² = SSE/(n − 2).
export function driftSlope(values: readonly (number | null)[]): { slope: number; se: number } | null {
  let n = 0;
  let si = 0;
  let sv = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!finite(v)) continue;
    n++;
    si += i;
    sv += v;
  }
  if (n < 3) return null;
  const mx = si / n;
  const my = sv / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!finite(v)) continue;
    sxx += (i - mx) ** 2;
    sxy += (i - mx) * (v - my);
  }
  const slope = sxy / sxx;
  let sse = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (finite(v)) sse += (v - my - slope * (i - mx)) ** 2;
  }
  return { slope, se: Math.sqrt(sse / (n - 2) / sxx) };
}
