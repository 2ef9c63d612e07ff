import { describe, expect, it } from 'vitest';
import { computeWeighout, type WeighoutPlan } from '../../../../src/lib/batches/weighout';
import { grams, input, pct, phosphor } from './fixtures';

function plan(i: Parameters<typeof computeWeighout>[0]): WeighoutPlan {
  const r = computeWeighout(i);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('; '));
  return r.plan;
}
const rows = (p: WeighoutPlan) => p.lines.map((l) => [l.code, l.targetG, l.lowG, l.highG]);
/** Sum of the printed targets, done in integer thousandths by hand-independent string parsing. */
const sumSteps = (p: WeighoutPlan) => p.lines.reduce((a, l) => a + l.targetSteps, 0);

// Weighing order part A → phosphors → additives → part B: common practice for two-part
// addition-cure silicone (pot-life clock starts when B is mixed in).
describe('weigh-out, hand-worked examples (worked in the comments)', () => {
  it('1:1 silicone, 20.000 g at 12 + 3 wt % of slurry, balance 0.001 g', () => {
    // YL 20 × 12 % = 2.400 g; RD 20 × 3 % = 0.600 g; silicone 20 − 3 = 17.000 g → A = B = 8.500 g.
    // Ranges: YL ±0.5 % = ±0.012 → 2.388–2.412; RD ±0.003 → 0.597–0.603; A, B ±1 % = ±0.085 → 8.415–8.585.
    const p = plan(input());
    expect(rows(p)).toEqual([
      ['PART A', '8.500', '8.415', '8.585'],
      ['YL-568', '2.400', '2.388', '2.412'],
      ['RD-625', '0.600', '0.597', '0.603'],
      ['PART B', '8.500', '8.415', '8.585']
    ]);
    expect(p.batchMassG).toBe('20.000');
    expect(sumSteps(p)).toBe(20_000);
    expect(p.phosphorWtPctOfSlurry).toBe(15);
    // phr = 3 / 17 × 100 = 17.6470…
    expect(p.phosphorPhr).toBeCloseTo(17.6471, 4);
  });

  it('10:1 silicone, 10.000 g at 7 + 2.5 wt %: the left-over step goes to the largest remainder', () => {
    // GL 0.700 g, RD 0.250 g; silicone 10 − 0.95 = 9.050 g; A = 9.05 × 10/11 = 8.22727… g, B = 0.82272… g.
    // In 0.001 g steps: A 8227.27, B 822.73, GL 700, RD 250 → floors sum 9999, one step left;
    // remainders .27 (A) < .73 (B) → B = 823. Printed: 8.227 + 0.700 + 0.250 + 0.823 = 10.000.
    // A range: ideal × 0.99 = 8.145 exactly, ideal × 1.01 = 8.30954… → 8.145–8.309.
    // B range: 0.8145 → rounded inward 0.815; 0.83095… → 0.830. GL ±0.0035 → 0.697–0.703; RD ±0.00125 → 0.249–0.251.
    const p = plan(
      input({
        sizing: { kind: 'mass', batchMassG: 10 },
        phosphors: [phosphor('GL-530', 7), phosphor('RD-625', 2.5)],
        silicone: { name: 'Test 10:1', ratioA: 10, ratioB: 1, toleranceA: pct(1), toleranceB: pct(1) }
      })
    );
    expect(rows(p)).toEqual([
      ['PART A', '8.227', '8.145', '8.309'],
      ['GL-530', '0.700', '0.697', '0.703'],
      ['RD-625', '0.250', '0.249', '0.251'],
      ['PART B', '0.823', '0.815', '0.830']
    ]);
    expect(sumSteps(p)).toBe(10_000);
    expect(p.siliconeRatio).toBe('10:1');
  });

  it('phr basis with a 10:1 silicone on a 0.01 g balance', () => {
    // 22.00 g at 10 phr: S = 22 × 100/110 = 20 g, YL = 2.00 g; A = 18.1818…, B = 1.8181… g.
    // Steps of 0.01: 1818.18 + 181.82 + 200 → floors 2199, one left → B (remainder .82) = 1.82 g.
    const p = plan(
      input({
        sizing: { kind: 'mass', batchMassG: 22 },
        loading: { basis: 'phr', totalPct: null },
        phosphors: [phosphor('YL-568', 10)],
        silicone: { name: 'Test 10:1', ratioA: 10, ratioB: 1, toleranceA: pct(1), toleranceB: pct(1) },
        balance: { resolutionG: 0.01, minWeightG: 0.5 }
      })
    );
    expect(p.lines.map((l) => l.targetG)).toEqual(['18.18', '2.00', '1.82']);
    expect(p.lines[1].lowG).toBe('1.99'); // ±0.5 % of 2 g = ±0.01 g (exactly one step: allowed)
    expect(p.lines[1].highG).toBe('2.01');
    expect(sumSteps(p)).toBe(2200);
    // 2 g of 22 g = 9.0909 wt % of slurry.
    expect(p.phosphorWtPctOfSlurry).toBeCloseTo(9.0909, 4);
    expect(p.phosphorPhr).toBe(10);
  });

  it('a total loading splits in the proportions of the per-phosphor loadings', () => {
    // Revision split 6 : 10 : 4 (= 20 wt %); total set to 25 wt % → 7.5, 12.5, 5 wt %.
    // 40.000 g: GL 3.000, YL 5.000, RD 2.000; silicone 30.000 → 15.000 + 15.000.
    const p = plan(
      input({
        sizing: { kind: 'mass', batchMassG: 40 },
        loading: { basis: 'wtPctOfSlurry', totalPct: 25 },
        phosphors: [phosphor('GL-530', 6), phosphor('YL-568', 10), phosphor('RD-625', 4)]
      })
    );
    expect(p.lines.map((l) => [l.code, l.targetG, l.basisPct])).toEqual([
      ['PART A', '15.000', null],
      ['GL-530', '3.000', 7.5],
      ['YL-568', '5.000', 12.5],
      ['RD-625', '2.000', 5],
      ['PART B', '15.000', null]
    ]);
  });

  it('breaks equal remainders toward the earlier line', () => {
    // 10.001 g, 10 wt %: phosphor 1000.1 steps, A = B = 4500.45 steps; floors 10000, one step left;
    // A and B tie at .45 with equal shares → part A (weighed first) gets it: 4.501 / 1.000 / 4.500.
    const p = plan(input({ sizing: { kind: 'mass', batchMassG: 10.001 }, phosphors: [phosphor('YL-568', 10)] }));
    expect(p.lines.map((l) => l.targetG)).toEqual(['4.501', '1.000', '4.500']);
  });

  it('includes additives on the same basis, before part B', () => {
    // 50.000 g, YL 10 wt % = 5.000 g, fumed silica 1.5 wt % = 0.750 g (±0.01 g → 0.740–0.760);
    // silicone 44.250 → 22.125 + 22.125.
    const p = plan(
      input({
        sizing: { kind: 'mass', batchMassG: 50 },
        phosphors: [phosphor('YL-568', 10)],
        additives: [{ code: 'FS-200', name: 'fumed silica', pct: 1.5, tolerance: grams(0.01) }]
      })
    );
    expect(rows(p)).toEqual([
      ['PART A', '22.125', '21.904', '22.346'],
      ['YL-568', '5.000', '4.975', '5.025'],
      ['FS-200', '0.750', '0.740', '0.760'],
      ['PART B', '22.125', '21.904', '22.346']
    ]);
  });

  it('sizes a batch from a part count with a yield-loss allowance (rounded up, never short)', () => {
    // 500 parts × 0.025 g ÷ (1 − 20 %) = 15.625 g → 0.01 g balance → 15.63 g.
    const p = plan(
      input({
        sizing: { kind: 'parts', partCount: 500, dispenseMassG: 0.025, yieldLossPct: 20 },
        balance: { resolutionG: 0.01, minWeightG: 0.1 },
        phosphors: [phosphor('YL-568', 12, grams(0.02)), phosphor('RD-625', 3, grams(0.02))]
      })
    );
    expect(p.batchMassG).toBe('15.63');
    expect(sumSteps(p)).toBe(1563);
    expect(p.notes[0]).toMatch(/15\.625/);
  });
});

describe('weigh-out refuses impossible inputs with a reason', () => {
  const refused = (i: Parameters<typeof computeWeighout>[0]) => {
    const r = computeWeighout(i);
    expect(r.ok).toBe(false);
    return r.ok ? [] : r.errors.map((e) => e.message).join(' | ');
  };

  it('loading of 100 wt % or more', () => {
    expect(refused(input({ loading: { basis: 'wtPctOfSlurry', totalPct: 100 } }))).toMatch(/below 100 %/);
  });
  it('phosphors + additives leaving no silicone', () => {
    expect(refused(input({ additives: [{ code: 'X', name: 'x', pct: 85, tolerance: pct(1) }] }))).toMatch(/leaving no silicone/);
  });
  it('a balance coarser than a line tolerance', () => {
    // RD 0.600 g ± 0.5 % = ±0.003 g, finer than a 0.01 g balance.
    expect(refused(input({ balance: { resolutionG: 0.01, minWeightG: 0 } }))).toMatch(
      /RD-625: tolerance ±0\.003.* finer than the balance resolution 0\.01 g/
    );
  });
  it('a line below the balance minimum weight, with the smallest batch that works', () => {
    // 2.000 g at 2.5 wt % RD = 0.050 g < 0.1 g; smallest batch: 0.1 × 2 / 0.05 = 4.000 g.
    const msg = refused(
      input({
        sizing: { kind: 'mass', batchMassG: 2 },
        phosphors: [phosphor('YL-568', 12, grams(0.005)), phosphor('RD-625', 2.5, grams(0.005))],
        balance: { resolutionG: 0.001, minWeightG: 0.1 }
      })
    );
    expect(msg).toMatch(/RD-625: target 0\.050 g is below the balance's minimum weight 0\.1 g/);
    expect(msg).toMatch(/at least 4\.000 g/);
  });
  it('a batch size that is not a whole number of balance steps', () => {
    expect(refused(input({ sizing: { kind: 'mass', batchMassG: 10.0005 } }))).toMatch(/not a whole number of balance steps/);
  });
});
