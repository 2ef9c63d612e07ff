/**
 * Lot statistics of an uploaded batch on the results view: counts, CCT capability against the 3000 K
 * quadrangle and the trend groups from a tester table whose CCT values are chosen for hand computation.
 * Tester values invented; the 3000 K target is the seeded revision's.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { createTesterProfile } from '../../../src/lib/server/measurements/tester-profiles';
import { testerProfileSchema } from '../../../src/lib/tester-table/profile';
import type { User } from '../../../src/lib/server/accounts/users';
import { completedBatch, csvFile, demoUser } from './support';

let quality: User;
let b: Awaited<ReturnType<typeof completedBatch>>;
let profileId: number;

beforeAll(async () => {
  quality = await demoUser('quality');
  b = await completedBatch();
  profileId = await createTesterProfile(
    quality,
    testerProfileSchema.parse({
      name: `Lot stats tester ${Math.random().toString(36).slice(2, 7)}`,
      headerLines: 0,
      delimiter: ',',
      decimalMark: '.',
      chromaticity: 'xy',
      columns: { label: 'Serial', x: 'x', y: 'y', cct: 'CCT' }
    })
  );
});
afterAll(closeDb);

describe('lot statistics of a measured batch', () => {
  it('counts, CCT capability and trend groups, hand-computed', async () => {
    // Six parts near the 3000 K centre (ANSI C78.377-2017 Table 1: x 0.4338, y 0.4030), CCT 2950…3050 K.
    const ccts = [2950, 3000, 3050, 2950, 3000, 3050];
    const rows = ccts.map(
      (cct, i) => `L${b.batchId}-${i + 1},${(0.4336 + 0.0001 * i).toFixed(4)},${(0.4031 - 0.0001 * (i % 2)).toFixed(4)},${cct}`
    );
    await uploadMeasurements(quality, b.batchId, {
      ...csvFile(['Serial,x,y,CCT', ...rows].join('\n'), 'lot.csv'),
      testerProfileId: profileId
    });
    const view = (await batchResults(b.batchId))!;
    const stats = view.lotStatistics!;
    expect(stats.parts).toBe(6);
    expect(stats.verdicts.reduce((a, v) => a + v.count, 0)).toBe(6);
    expect(stats.bins).toEqual([{ key: '3000', label: '3000 K', count: 6, share: 1 }]);
    // Mean 3000 K, s = √(4 · 2500 / 5) = 44.72 K; limits 2870–3220 K (ANSI C78.377-2017 Table 1, 3045 ± 175 K).
    // Cp = 350 / (6 s) = 1.3044; Cpk = 130 / (3 s) = 0.9690 (NIST/SEMATECH e-Handbook §6.1.6).
    const cct = stats.capability.find((c) => c.quantity === 'cct')!;
    expect(cct.mean).toBeCloseTo(3000, 6);
    expect(cct.sd).toBeCloseTo(Math.sqrt(2000), 6);
    expect(cct.cp!).toBeCloseTo(350 / (6 * Math.sqrt(2000)), 6);
    expect(cct.cpk!).toBeCloseTo(130 / (3 * Math.sqrt(2000)), 6);
    // Six parts → three consecutive groups of two (⌊n/2⌋ groups, common practice for run charts of short runs).
    const trend = stats.trend.find((t) => t.quantity === 'cct')!;
    expect(trend.groups.map((g) => [g.first, g.last, g.mean])).toEqual([
      [0, 1, 2975],
      [2, 3, 3000],
      [4, 5, 3025]
    ]);
    // The plot carries the mean's ellipse around the measured mean.
    expect(view.plot.meanConfidence?.points.length).toBeGreaterThan(10);
    expect(stats.ellipse!.mean.x).toBeCloseTo(0.43385, 6);
  });
});
