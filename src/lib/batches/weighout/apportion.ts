/**
 * Largest-remainder apportionment (Hamilton's method; Balinski & Young, "Fair Representation",
 * 2nd ed., 2001, ch. 2): turns exact shares that add up to a whole number N into whole numbers
 * that add up to exactly N, each within one unit of its share.
 *
 * Rule used for the weigh-out (in balance steps): every line gets ⌊share⌋; the steps left over
 * (N − Σ⌊share⌋, always fewer than the number of lines) go one each to the lines with the largest
 * remainders. Ties go to the larger share, then to the earlier line, so the result never depends
 * on anything but the input.
 */
import { Rat } from './rational';

export function largestRemainder(shares: readonly Rat[], total: bigint): bigint[] {
  const sum = shares.reduce((a, s) => a.add(s), Rat.ZERO);
  if (!sum.eq(new Rat(total))) throw new RangeError('shares must add up to the total exactly');
  if (shares.some((s) => s.n < 0n)) throw new RangeError('shares must not be negative');
  const out = shares.map((s) => s.floor());
  let left = total - out.reduce((a, v) => a + v, 0n);
  const order = shares.map((s, i) => ({ i, rem: s.frac(), s })).sort((a, b) => b.rem.cmp(a.rem) || b.s.cmp(a.s) || a.i - b.i);
  for (const { i } of order) {
    if (left === 0n) break;
    out[i] += 1n;
    left -= 1n;
  }
  return out;
}
