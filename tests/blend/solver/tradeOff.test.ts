import { describe, expect, it } from 'vitest';
import { paretoFront, traceTradeOff } from '../../../src/lib/blend/solver/tradeOff';
import { solveBlend } from '../../../src/lib/blend/solver/solveBlend';
import { THREE, FOUR, blue } from '../fixtures';

const target = { kind: 'ansiBin', nominalCct: 3000 } as const;

describe('trade-off front of LER against one rendition metric', () => {
  it('Pareto filter by hand: (1,5) (2,4) (2,3) (3,1) (0,6) (1,4) → (0,6) (1,5) (2,4) (3,1)', () => {
    // Worked by hand: (2,3) is beaten by (2,4); (1,4) by (1,5).
    const pts = [
      { a: 1, b: 5 },
      { a: 2, b: 4 },
      { a: 2, b: 3 },
      { a: 3, b: 1 },
      { a: 0, b: 6 },
      { a: 1, b: 4 }
    ];
    expect(
      paretoFront(pts)
        .map((i) => [pts[i].a, pts[i].b])
        .sort((x, y) => x[0] - y[0])
    ).toEqual([
      [0, 6],
      [1, 5],
      [2, 4],
      [3, 1]
    ]);
  });

  for (const metric of ['ra', 'r9', 'rf'] as const) {
    it(`${metric}: every front point is feasible and no evaluated mix beats it on both axes`, () => {
      const floors = { raMin: 80 };
      const r = traceTradeOff({ components: FOUR, target, floors, metric, points: 20 });
      expect(r.status).toBe('ok');
      expect(r.front.length).toBeGreaterThanOrEqual(5);
      for (const p of r.front) {
        // Floors held and the colour point on target (the solver's equal-chromaticity constraint).
        expect(p.candidate.evaluation.cri.ra).toBeGreaterThanOrEqual(80 - 0.5);
        expect(p.candidate.chromaticityError.steps).toBeLessThan(0.5);
        const beaten = r.evaluated.some(
          (e) => e.feasible && e.metric >= p.metric && e.ler >= p.lerLmPerW && (e.metric > p.metric || e.ler > p.lerLmPerW)
        );
        expect(beaten).toBe(false);
      }
      // Along the front the metric rises and LER falls: a point of the metric costs efficacy.
      for (let i = 1; i < r.front.length; i++) {
        expect(r.front[i].metric).toBeGreaterThan(r.front[i - 1].metric);
        expect(r.front[i].lerLmPerW).toBeLessThan(r.front[i - 1].lerLmPerW);
      }
    });
  }

  it('the low end of the front is the LER-optimal solve and the high end reaches the best Ra the solver finds', () => {
    const r = traceTradeOff({ components: THREE, target, metric: 'ra' });
    const bestLer = solveBlend({ components: THREE, target, objective: 'maxLer' }).candidates[0].evaluation.ler;
    const bestRa = solveBlend({ components: THREE, target, objective: 'maxRa' }).candidates[0].evaluation.cri.ra;
    expect(r.front[0].lerLmPerW).toBeGreaterThan(bestLer - 1);
    expect(r.front.at(-1)!.metric).toBeGreaterThan(bestRa - 1);
  });

  it('says so when no mix meets the floors, and when the target is out of gamut', () => {
    expect(traceTradeOff({ components: THREE, target, floors: { raMin: 99.5 }, metric: 'r9' }).status).toBe('noFeasibleMix');
    const twoGreens = blue('ph-gl530', 'ph-yg555');
    expect(traceTradeOff({ components: twoGreens, target, metric: 'ra' }).status).toBe('unreachable');
  });
});

describe('trade-off against the melanopic DER (CIE S 026/E:2018)', () => {
  // A set whose mixes at 3000 K span a range of melanopic DER (a yellow and an orange beside the green and red).
  const SPREAD = blue('ph-gl530', 'ph-yl568', 'ph-or600', 'ph-rd650');
  for (const metric of ['melDerHigh', 'melDerLow'] as const) {
    it(`${metric}: feasible points, none beaten by another mix tried, LER falling as the DER improves`, () => {
      const r = traceTradeOff({ components: SPREAD, target, floors: { raMin: 80 }, metric, points: 12 });
      expect(r.status).toBe('ok');
      expect(r.front.length).toBeGreaterThanOrEqual(3);
      const better = (a: number, b: number) => (metric === 'melDerHigh' ? a > b : a < b);
      for (const p of r.front) {
        expect(p.candidate.evaluation.alphaOpic.der.melanopic).toBeCloseTo(p.metric, 2);
        const beaten = r.evaluated.some(
          (e) => e.feasible && !better(p.metric, e.metric) && e.ler >= p.lerLmPerW && (better(e.metric, p.metric) || e.ler > p.lerLmPerW)
        );
        expect(beaten).toBe(false);
      }
      for (let i = 1; i < r.front.length; i++) {
        expect(better(r.front[i].metric, r.front[i - 1].metric)).toBe(true);
        expect(r.front[i].lerLmPerW).toBeLessThan(r.front[i - 1].lerLmPerW);
      }
    });
  }
});
