/**
 * Descriptive statistics of a batch quantity: count, arithmetic mean, sample standard deviation
 * s = √(Σ(xᵢ − x̄)² / (n − 1)) (Bessel's correction; ISO 3534-1:2006 §1.17), minimum, maximum.
 * Missing values (null, NaN, ±∞) are left out and `n` says how many values were used.
 * Two-pass formula (mean first, then squared deviations) for numerical stability.
 */
import type { Stat } from './types';

export function describe(values: readonly (number | null)[]): Stat | null {
  let n = 0;
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (v === null || !Number.isFinite(v)) continue;
    n++;
    sum += v;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (n === 0) return null;
  const mean = sum / n;
  let ss = 0;
  for (const v of values) if (v !== null && Number.isFinite(v)) ss += (v - mean) ** 2;
  return { n, mean, sd: n > 1 ? Math.sqrt(ss / (n - 1)) : 0, min, max };
}
