/**
 * Histogram data for the batch charts (CCT, Ra): equal-width bins on "nice" boundaries
 * (width 1, 2, 2.5 or 5 × 10ᵏ, the usual axis-tick rule), bins half-open [x0, x1) except the
 * last, which also holds its upper edge. Missing values are left out.
 */
import type { HistogramBin } from './types';

/** A nice bin width near span / targetBins. */
export function niceStep(span: number, targetBins: number): number {
  const raw = span / Math.max(1, targetBins);
  const p = 10 ** Math.floor(Math.log10(raw));
  const f = raw / p;
  const m = f <= 1 ? 1 : f <= 2 ? 2 : f <= 2.5 ? 2.5 : f <= 5 ? 5 : 10;
  return m * p;
}

const tidy = (v: number): number => Number(v.toPrecision(12));

export function histogram(values: readonly (number | null)[], targetBins = 10): HistogramBin[] {
  const v = values.filter((x): x is number => x !== null && Number.isFinite(x));
  if (v.length === 0) return [];
  let lo = Infinity;
  let hi = -Infinity;
  for (const x of v) {
    if (x < lo) lo = x;
    if (x > hi) hi = x;
  }
  if (hi === lo) {
    // One value: a single bin centred on it, about 2 % of its size wide.
    const w = lo === 0 ? 1 : niceStep(Math.abs(lo) / 50, 1);
    return [{ x0: tidy(lo - w / 2), x1: tidy(lo + w / 2), count: v.length }];
  }
  const step = niceStep(hi - lo, targetBins);
  const start = Math.floor(lo / step) * step;
  const count = Math.max(1, Math.ceil(tidy((hi - start) / step)));
  const bins: HistogramBin[] = Array.from({ length: count }, (_, i) => ({
    x0: tidy(start + i * step),
    x1: tidy(start + (i + 1) * step),
    count: 0
  }));
  for (const x of v) {
    // Rounding to 12 digits only moves a position up to the next edge when it lies within 1e-9 below it:
    // elsewhere the floor is the same without the (slow) decimal round trip.
    const r = (x - start) / step;
    let i = Math.floor(r);
    if (i + 1 - r < 1e-9) i = Math.floor(tidy(r));
    bins[Math.min(count - 1, Math.max(0, i))].count++;
  }
  return bins;
}
