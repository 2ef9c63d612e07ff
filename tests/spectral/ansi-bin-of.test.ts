/**
 * ansiBinOf names the same ANSI C78.377-2017 Table 1 bin as findAnsiBin (the quadrangle that holds the point),
 * at each Table 1 centre and on a grid across the white region; none far from the locus.
 */
import { describe, expect, it } from 'vitest';
import { ansiBinOf, ansiNominalQuadrangles, findAnsiBin } from '../../src/lib/spectral/ansi/c78377';

describe('ansiBinOf', () => {
  it('agrees with findAnsiBin at each centre and over a grid', () => {
    for (const q of ansiNominalQuadrangles()) expect(ansiBinOf(q.centre[0], q.centre[1])).toBe(q.nominalCct);
    for (let x = 0.28; x <= 0.5; x += 0.0025)
      for (let y = 0.28; y <= 0.44; y += 0.0025) expect(ansiBinOf(x, y)).toBe(findAnsiBin(x, y)?.nominalCct ?? null);
    // A saturated green (x 0.3, y 0.6) lies far from every Table 1 quadrangle (ANSI C78.377-2017 Table 1).
    expect(ansiBinOf(0.3, 0.6)).toBeNull();
  });
});
