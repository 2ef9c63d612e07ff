/**
 * Binomial confidence interval of a measured yield: the Wilson score interval
 * (E. B. Wilson, JASA 22 (1927) 209–212; as method 3 of R. G. Newcombe, Stat. Med. 17 (1998) 857–872):
 *   centre = (p̂ + z²/2n) / (1 + z²/n),  half-width = z √(p̂(1 − p̂)/n + z²/4n²) / (1 + z²/n).
 */

export interface BinomialInterval {
  share: number;
  low: number;
  high: number;
}

/** z for a two-sided 95 % interval (standard normal 97.5 % point). */
export const Z95 = 1.959963984540054;

export function wilsonInterval(successes: number, trials: number, z = Z95): BinomialInterval | null {
  if (!(trials > 0) || successes < 0 || successes > trials) return null;
  const p = successes / trials;
  const z2 = z * z;
  const d = 1 + z2 / trials;
  const centre = (p + z2 / (2 * trials)) / d;
  const half = (z * Math.sqrt((p * (1 - p)) / trials + z2 / (4 * trials * trials))) / d;
  return { share: p, low: Math.max(0, centre - half), high: Math.min(1, centre + half) };
}
