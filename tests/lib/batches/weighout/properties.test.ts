import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeWeighout, Rat, type ToleranceSpec, type WeighoutInput } from '../../../../src/lib/batches/weighout';

// Properties of the rounding rule (largest remainder, ranges rounded inward) for valid inputs:
// the printed lines add up to the batch exactly, each target lies within one balance step of its
// exact mass and inside its printed range, and the printed range never reaches outside
// ideal ± tolerance. Balance steps 1-2-5 × 10ⁿ are common practice for laboratory balances.
const resolution = fc.constantFrom(0.0001, 0.001, 0.002, 0.005, 0.01, 0.1);
const decimal = (min: number, max: number, places: number) =>
  fc.integer({ min: min * 10 ** places, max: max * 10 ** places }).map((v) => v / 10 ** places);
const tolerance: fc.Arbitrary<ToleranceSpec> = fc.oneof(
  decimal(0.1, 5, 2).map((value) => ({ kind: 'pct' as const, value })),
  decimal(0.1, 2, 3).map((value) => ({ kind: 'g' as const, value }))
);

const inputs: fc.Arbitrary<WeighoutInput> = fc
  .record({
    res: resolution,
    steps: fc.integer({ min: 2_000, max: 3_000_000 }),
    basis: fc.constantFrom('wtPctOfSlurry' as const, 'phr' as const),
    total: fc.option(decimal(1, 60, 2), { nil: null }),
    phosphors: fc.array(fc.record({ pct: decimal(0.05, 18, 3), tolerance }), { minLength: 1, maxLength: 5 }),
    additives: fc.array(fc.record({ pct: decimal(0.1, 3, 2), tolerance }), { maxLength: 2 }),
    ratio: fc.oneof(fc.constant([1, 1]), fc.constant([10, 1]), fc.tuple(decimal(0.5, 20, 1), decimal(0.5, 20, 1))),
    tolA: tolerance,
    tolB: tolerance
  })
  .map((r) => ({
    sizing: { kind: 'mass' as const, batchMassG: Number(new Rat(BigInt(r.steps)).mul(Rat.fromNumber(r.res)).toDecimal()) },
    loading: { basis: r.basis, totalPct: r.total },
    phosphors: r.phosphors.map((p, i) => ({ materialId: null, code: `P${i}`, name: `phosphor ${i}`, ...p })),
    additives: r.additives.map((a, i) => ({ code: `A${i}`, name: `additive ${i}`, ...a })),
    silicone: { name: 'S', ratioA: r.ratio[0], ratioB: r.ratio[1], toleranceA: r.tolA, toleranceB: r.tolB },
    balance: { resolutionG: r.res, minWeightG: 0 }
  }));

describe('weigh-out rounding properties (fast-check)', () => {
  it('never leaves a line outside its range, and the lines add up exactly', () => {
    let accepted = 0;
    fc.assert(
      fc.property(inputs, (inp) => {
        const r = computeWeighout(inp);
        if (!r.ok) {
          // The only refusals possible here: loading ≥ 100 %, tolerance finer than a step, a line rounding to 0 g,
          // a batch above the 100 kg limit.
          for (const e of r.errors)
            expect(e.message).toMatch(/below 100 %|no silicone|finer than the balance resolution|minimum weight|at most 100 kg/);
          return;
        }
        accepted++;
        const res = Rat.fromNumber(inp.balance.resolutionG);
        const sum = r.plan.lines.reduce((a, l) => a + BigInt(l.targetSteps), 0n);
        expect(sum).toBe(BigInt(r.plan.batchSteps));
        for (const l of r.plan.lines) {
          expect(l.lowSteps).toBeLessThanOrEqual(l.targetSteps);
          expect(l.targetSteps).toBeLessThanOrEqual(l.highSteps);
          const ideal = Rat.parse(l.idealG)!; // rounded to places + 3: compare with a small margin
          const target = new Rat(BigInt(l.targetSteps)).mul(res);
          expect(target.sub(ideal).toNumber()).toBeLessThan(res.toNumber() * 1.001);
          expect(ideal.sub(target).toNumber()).toBeLessThan(res.toNumber() * 1.001);
          const tol = Rat.parse(l.toleranceG)!.toNumber();
          expect(Rat.parse(l.highG)!.toNumber() - ideal.toNumber()).toBeLessThanOrEqual(tol + res.toNumber() * 0.002);
          expect(ideal.toNumber() - Rat.parse(l.lowG)!.toNumber()).toBeLessThanOrEqual(tol + res.toNumber() * 0.002);
        }
      }),
      { numRuns: 400, seed: 20261202 }
    );
    expect(accepted).toBeGreaterThan(100); // the property is not vacuous
  });

  it('scaling a valid batch up keeps it valid and exact', () => {
    fc.assert(
      fc.property(inputs, fc.integer({ min: 2, max: 20 }), (inp, k) => {
        const r = computeWeighout(inp);
        fc.pre(r.ok);
        const bigger = {
          ...inp,
          sizing: {
            kind: 'mass' as const,
            batchMassG: Number(
              Rat.fromNumber(inp.sizing.kind === 'mass' ? inp.sizing.batchMassG : 0)
                .mul(Rat.int(k))
                .toDecimal()
            )
          }
        };
        const r2 = computeWeighout(bigger);
        if (bigger.sizing.batchMassG > 100_000) {
          expect(r2.ok).toBe(false); // above the 100 kg batch limit: refused, never clipped
          return;
        }
        expect(r2.ok).toBe(true);
        if (r2.ok && r.ok) expect(r2.plan.lines.reduce((a, l) => a + l.targetSteps, 0)).toBe(r.plan.batchSteps * k);
      }),
      { numRuns: 150, seed: 7 }
    );
  });
});
