/**
 * Mixing-desk arithmetic (pure): the optical fractions of pump leak + phosphors always add up
 * to 1. Setting a phosphor's share takes the difference from the pump leak first (more phosphor
 * converts more of the pump), and only when the leak runs out from the other phosphors in
 * proportion; so typing each phosphor's share in turn gives exactly those shares. Setting the
 * pump leak rescales the phosphors, keeping their proportions; when they are all zero the
 * remainder is split evenly.
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
export function setShareProportional(shares: readonly number[], k: number, share: number): number[] {
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

/** Shares with component k set to `share`; the difference comes out of component `balance` (the pump leak) first. */
export function setShare(shares: readonly number[], k: number, share: number, balance = 0): number[] {
  if (k === balance || shares.length <= 2) return setShareProportional(shares, k, share);
  if (k < 0 || k >= shares.length) throw new RangeError(`no component ${k}`);
  const s = Math.min(1, Math.max(0, Number.isFinite(share) ? share : 0));
  const out = normaliseShares(shares);
  const leak = out[balance] - (s - out[k]);
  out[k] = s;
  if (leak >= 0) {
    out[balance] = leak;
    return out;
  }
  out[balance] = 0;
  const others = out.reduce((sum, f, i) => (i === k || i === balance ? sum : sum + f), 0);
  const keep = 1 - s;
  return out.map((f, i) => (i === k || i === balance ? f : others > 1e-12 ? (f / others) * keep : keep / (out.length - 2)));
}
