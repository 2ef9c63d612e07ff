/**
 * A forecast cloud kept for drawing: every k-th part up to `max` points (evenly through the run, so a
 * pooled per-bin cloud keeps each bin's share), x,y rounded to 5 decimals (0.00001 in x,y is far below
 * a 1-step ellipse), with the chip bin of each point when the forecast was made bin by bin.
 */
export interface CloudSample {
  points: [number, number][];
  /** Chip bin code of each point, parallel to `points`; null for a forecast of one recipe. */
  bins: string[] | null;
}

export const CLOUD_SAMPLE_MAX = 2000;

const r5 = (v: number): number => Math.round(v * 1e5) / 1e5;

/** `binOf(i)` gives the bin code of part i (or is omitted for a single recipe). */
export function cloudSample(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  binOf: ((i: number) => string) | null = null,
  max = CLOUD_SAMPLE_MAX
): CloudSample {
  const n = x.length;
  const step = Math.max(1, Math.ceil(n / max));
  const points: [number, number][] = [];
  const bins: string[] = [];
  for (let i = 0; i < n; i += step) {
    points.push([r5(x[i]), r5(y[i])]);
    if (binOf) bins.push(binOf(i));
  }
  return { points, bins: binOf ? bins : null };
}

/** The sample's points of one chip bin (all points when the sample has no bins or the code is null). */
export function samplePointsOf(sample: CloudSample, binCode: string | null): [number, number][] {
  if (!sample.bins || !binCode) return sample.points;
  const key = binCode.toUpperCase();
  return sample.points.filter((_, i) => sample.bins![i].toUpperCase() === key);
}
