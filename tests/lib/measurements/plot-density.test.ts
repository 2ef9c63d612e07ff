/**
 * A large lot on the chromaticity plot: past MAX_PLOT_PARTS every part is counted in the hexagonal
 * density (counts add up to the lot) and only the failing parts are drawn as points; a small lot is
 * drawn part by part. Target: ANSI C78.377 3000 K bin, 3-step ellipse; parts invented.
 */
import { describe, expect, it } from 'vitest';
import { chromaticityPlotModel, defaultAcceptance, judgeBatch } from '../../../src/lib/measurements/index';
import { MAX_PLOT_PARTS } from '../../../src/lib/measurements/plotModel';
import { testerPartAt } from './support';

const target = { kind: 'ansiBin', nominalCct: 3000 } as const;
const acceptance = defaultAcceptance({ target, tolerance: { kind: 'sdcm', steps: 3 }, floors: {} });
function lot(n: number) {
  let s = 3;
  const rnd = () => (s = (s * 16807) % 2147483647) / 2147483647;
  return Array.from({ length: n }, (_, i) => testerPartAt(i, 0.4338 + 0.006 * (rnd() - 0.5), 0.403 + 0.004 * (rnd() - 0.5)));
}

describe('plot of a large lot', () => {
  it('counts every part in the density and draws the failing ones as points', () => {
    const batch = judgeBatch(lot(MAX_PLOT_PARTS + 3000), target, acceptance);
    const m = chromaticityPlotModel(batch);
    const failing = batch.parts.filter((p) => !p.verdict.pass).length;
    expect(m.totalParts).toBe(MAX_PLOT_PARTS + 3000);
    expect(m.density!.bins.reduce((a, b) => a + b.n, 0)).toBe(MAX_PLOT_PARTS + 3000);
    expect(m.parts).toHaveLength(Math.min(failing, MAX_PLOT_PARTS));
    expect(m.parts.every((p) => !p.pass)).toBe(true);
  });

  it('draws a small lot part by part, without a density', () => {
    const m = chromaticityPlotModel(judgeBatch(lot(300), target, acceptance));
    expect(m.density).toBeNull();
    expect(m.parts).toHaveLength(300);
  });
});
