/**
 * Mixing-desk arithmetic (pure): the optical fractions of pump leak + phosphors always add up
 * to 1. Setting one component's share rescales the others so that their proportions to each
 * other stay as they were; when the others are all zero the remainder is split evenly.
 */

/** n equal shares. */
export function evenShares(n: number): number[] {
  return Array.from({ length: n }, () => 1 / n);
}

/** Non-negative, finite weights scaled to add up to 1 (even shares when all are zero). */
export function normaliseShares(weights: readonly number[]): number[] {
  const clean = weights.map((w) => (Number.isFinite(w) && w > 0 ? w : 0));
  const sum = clean.reduce((a, b) => a + b, 0);
  return sum > 0 ? clean.map((w) => w / sum) : evenShares(weights.length);
}

/** Shares with component k set to `share` (clamped to 0…1), the others in their old proportions. */
export function setShare(shares: readonly number[], k: number, share: number): number[] {
  const n = shares.length;
  if (k < 0 || k >= n) throw new RangeError(`no component ${k}`);
  const s = Math.min(1, Math.max(0, Number.isFinite(share) ? share : 0));
  if (n === 1) return [1];
  const current = normaliseShares(shares);
  const rest = current.reduce((sum, f, i) => (i === k ? sum : sum + f), 0);
  return current.map((f, i) => {
    if (i === k) return s;
    return rest > 1e-12 ? (f / rest) * (1 - s) : (1 - s) / (n - 1);
  });
}

/**
 * Shares rounded to `digits` decimals that still add up to exactly 1 at that precision: the
 * rounding remainder goes to the largest share (largest-remainder idea, kept simple).
 */
export function roundedShares(shares: readonly number[], digits = 4): number[] {
  const unit = 10 ** digits;
  const ints = shares.map((f) => Math.round(f * unit));
  const diff = unit - ints.reduce((a, b) => a + b, 0);
  let big = 0;
  ints.forEach((v, i) => (v > ints[big] ? (big = i) : undefined));
  ints[big] += diff;
  return ints.map((v) => v / unit);
}
