/**
 * Past the ends of the Planckian table (1000–20 000 K, Ohno 2014 §2) CCT and Duv are extrapolated from
 * the end rows; the answer must not depend on which rows earlier calls happened to fill (the table is
 * filled lazily). A fresh module answers the first call exactly as it answers after a sweep of the locus.
 */
import { describe, expect, it, vi } from 'vitest';

const BEYOND = [
  [0.16636, 0.28244], // about 20 000 K, Duv about −0.02
  [0.1605, 0.2635] // bluer still, past the end row
] as const;

async function freshCct() {
  vi.resetModules();
  return (await import('../../src/lib/spectral/cct/ohno2014')).uvToCctOhno2014;
}

describe('Ohno 2014 past the table ends', () => {
  it('gives the same CCT and Duv on a first call as after the whole table is filled', async () => {
    for (const [u, v] of BEYOND) {
      const first = (await freshCct())(u, v);
      const cct = await freshCct();
      // Fill every row by a sweep along the locus, 1000–20 000 K.
      const { planckianUv } = await import('../../src/lib/spectral/cct/planckian-locus');
      for (let t = 1000; t <= 20_000; t *= 1.0005) cct(...planckianUv(t));
      expect(cct(u, v)).toEqual(first);
      expect(Number.isFinite(first.cct) && Number.isFinite(first.duv)).toBe(true);
    }
  });
});
