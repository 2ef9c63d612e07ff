/**
 * Measured against predicted yield: the share of measured parts inside the revision's colour
 * tolerance, with its 95 % Wilson score interval (Wilson 1927; Newcombe 1998), beside the share the
 * revision's latest production-spread forecast predicted. A forecast outside the interval says the
 * line spreads more (or less) than the variation model assumed.
 */
import { colourDistance, withinTolerance, type ColourCentre, type Tolerance } from '../aim/distance';
import { wilsonInterval, type BinomialInterval } from '../blend/spread/wilson';

export interface YieldComparison {
  inside: number;
  total: number;
  measured: BinomialInterval;
  /** Predicted share inside the tolerance, with the forecast's part count and time; null without a forecast. */
  predicted: { share: number; parts: number; computedAt: Date } | null;
  /** Where the forecast stands against the measured interval. */
  verdict: 'consistent' | 'forecastHigh' | 'forecastLow' | 'noForecast';
}

export function yieldComparison(
  parts: readonly { x: number; y: number }[],
  target: ColourCentre,
  tolerance: Tolerance,
  forecast: { inTolerance: number | null; parts: number; computedAt: Date } | null
): YieldComparison | null {
  const inside = parts.filter((p) => withinTolerance(colourDistance(p.x, p.y, target), tolerance)).length;
  const measured = wilsonInterval(inside, parts.length);
  if (!measured) return null;
  const predicted =
    forecast && forecast.inTolerance !== null
      ? { share: forecast.inTolerance, parts: forecast.parts, computedAt: forecast.computedAt }
      : null;
  const verdict = !predicted
    ? 'noForecast'
    : predicted.share > measured.high
      ? 'forecastHigh'
      : predicted.share < measured.low
        ? 'forecastLow'
        : 'consistent';
  return { inside, total: parts.length, measured, predicted, verdict };
}
