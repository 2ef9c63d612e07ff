import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeWeighout, revisionLoadings, weighoutInputFromRevision, type WeighoutPlan } from '../../../../src/lib/batches/weighout';
import type { RevisionContent } from '../../../../src/lib/recipe';
import type { CreateBatchRequest } from '../../../../src/lib/batches/schema';

// A batch planned from a revision weighs the revision's exact masses. The exact masses are worked
// out here on their own, with plain BigInt fractions (not the product's arithmetic): the revision's
// wt % of total slurry wᵢ fixes phosphor i at M·wᵢ/100 of a batch of M g, and the silicone at
// M·(100 − Σw)/100 split a : b by weight. On the phr basis phrᵢ = wᵢ·100/(100 − Σw) and the silicone
// S = M·100/(100 + Σphr), so S·phrᵢ/100 = M·wᵢ/100: the same masses (definition of phr, common practice).

type Frac = { n: bigint; d: bigint };
const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? (a < 0n ? -a : a) : gcd(b, a % b));
const frac = (n: bigint, d: bigint): Frac => {
  const g = gcd(n, d) || 1n;
  return { n: n / g, d: d / g };
};
const add = (a: Frac, b: Frac) => frac(a.n * b.d + b.n * a.d, a.d * b.d);
const sub = (a: Frac, b: Frac) => frac(a.n * b.d - b.n * a.d, a.d * b.d);
const mul = (a: Frac, b: Frac) => frac(a.n * b.n, a.d * b.d);
const div = (a: Frac, b: Frac) => frac(a.n * b.d, a.d * b.n);
/** The decimal a number prints as ("15.14" → 1514/100), exactly. */
function dec(v: number | string): Frac {
  const [int, fr = ''] = String(v).split('.');
  if (/e/i.test(String(v))) throw new Error(`test decimal ${v} in exponent form`);
  return frac(BigInt(int + fr), 10n ** BigInt(fr.length));
}
const HUNDRED = frac(100n, 1n);
/** |a − b| ≤ c */
const within = (a: Frac, b: Frac, c: Frac) => {
  const x = sub(a, b);
  const ax = x.n < 0n ? frac(-x.n, x.d) : x;
  return ax.n * c.d <= c.n * ax.d;
};

function exactMasses(wt: number[], ratio: [number, number], massG: Frac): Frac[] {
  const w = wt.map(dec);
  const sumW = w.reduce(add, frac(0n, 1n));
  const silicone = div(mul(massG, sub(HUNDRED, sumW)), HUNDRED);
  const [a, b] = ratio.map(dec);
  return [div(mul(silicone, a), add(a, b)), ...w.map((x) => div(mul(massG, x), HUNDRED)), div(mul(silicone, b), add(a, b))];
}

function revision(wt: number[], ratio: [number, number]): RevisionContent {
  return {
    pump: { materialId: 1, code: 'B-450', name: 'pump' },
    phosphors: wt.map((w, i) => ({ materialId: 10 + i, code: `PH-${i}`, name: `phosphor ${i}`, opticalFraction: 0.1, wtPct: w })),
    pumpLeakFraction: 0.1,
    loading: { pathLengthMm: 0.3, basis: 'wtPctOfSlurry' },
    silicone: {
      siliconeSystemId: null,
      name: 'Test encapsulant',
      ratioA: ratio[0],
      ratioB: ratio[1],
      potLifeMin: 240,
      cure: '',
      densityGPerCm3: 1.1
    },
    target: { kind: 'cctDuv', cct: 3000, duv: 0 },
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: { raMin: 80, r9Min: 0 },
    notes: ''
  } as RevisionContent;
}

function request(basis: 'phr' | 'wtPctOfSlurry', massG: number, resolutionG: number, n: number): Omit<CreateBatchRequest, 'revisionId'> {
  const tol = { kind: 'g' as const, value: resolutionG };
  return {
    sizing: { kind: 'mass', batchMassG: massG },
    loading: { mode: 'perPhosphor', basis },
    phosphorTolerances: Array.from({ length: n }, () => tol),
    siliconeTolerances: { a: tol, b: tol },
    additives: [],
    balance: { resolutionG, minWeightG: 0 }
  };
}

function plan(content: RevisionContent, req: Omit<CreateBatchRequest, 'revisionId'>): WeighoutPlan | { errors: string[] } {
  const built = weighoutInputFromRevision(content, req);
  if (!built.ok) return { errors: built.errors.map((e) => e.message) };
  const r = computeWeighout(built.input);
  return r.ok ? r.plan : { errors: r.errors.map((e) => e.message) };
}

/** Every line within one balance step of the exact mass, and the lines summing to the batch exactly. */
function expectExact(p: WeighoutPlan, exact: Frac[], massG: Frac, res: Frac) {
  expect(p.lines).toHaveLength(exact.length);
  p.lines.forEach((l, i) => expect(within(dec(l.targetG), exact[i], res), `${l.code} ${l.targetG} g`).toBe(true));
  const sum = p.lines.reduce((a, l) => add(a, dec(l.targetG)), frac(0n, 1n));
  expect(sum).toEqual(massG);
}

describe("revision → weigh-out on the phr basis weighs the revision's exact masses (regression)", () => {
  // 15.14 / 2.65 wt %, 50 kg at 1 mg: the phr printed to 4 decimals (18.4163, 3.2235) used to be weighed,
  // which put the lines 14 to 19 balance steps off the revision's masses (worked out with plain fractions from the
  // definitions above).
  const wt = [15.14, 2.65];
  const content = revision(wt, [1, 1]);

  it('prints phr to 4 decimals (display only)', () => {
    // phr = w·100/(100 − Σw) = 1514/82.21 = 18.41625…, 265/82.21 = 3.223452… (definition of phr, common practice)
    expect(revisionLoadings(content, 'phr')).toEqual([18.4163, 3.2235]);
  });

  it('50 kg at 1 mg: every line within one step, lines sum to the batch', () => {
    const p = plan(content, request('phr', 50_000, 0.001, 2));
    if ('errors' in p) throw new Error(p.errors.join('; '));
    const exact = exactMasses(wt, [1, 1], dec(50_000));
    expectExact(p, exact, dec(50_000), dec(0.001));
    // The printed phr is not what is weighed: the phosphor lines sit on 7570 g and 1325 g, exactly M·w/100.
    expect(p.lines.map((l) => l.targetG)).toEqual(['20552.500', '7570.000', '1325.000', '20552.500']);
  });

  it('a typed loading equal to the printed phr weighs the exact value too', () => {
    const req = request('phr', 50_000, 0.001, 2);
    const p = plan(content, { ...req, loading: { mode: 'perPhosphor', basis: 'phr', pcts: [18.4163, 3.2235] } });
    if ('errors' in p) throw new Error(p.errors.join('; '));
    expectExact(p, exactMasses(wt, [1, 1], dec(50_000)), dec(50_000), dec(0.001));
  });
});

describe('revision → weigh-out property: exact masses within one balance step (fast-check)', () => {
  // Balance steps 0.1 mg – 1 g and mix ratios 1:1 and 10:1 are common practice for two-part silicones.
  const resolutions = [0.0001, 0.001, 0.01, 0.1, 1];
  const cases = fc.record({
    wt: fc
      .array(fc.integer({ min: 1, max: 1_200_000 }), { minLength: 1, maxLength: 5 })
      .map((xs) => xs.map((x) => x / 100_000))
      .filter((xs) => xs.reduce((a, x) => a + x, 0) <= 60),
    ratio: fc.constantFrom<[number, number]>([1, 1], [10, 1]),
    resIndex: fc.integer({ min: 0, max: resolutions.length - 1 }),
    massFraction: fc.double({ min: 0, max: 1, noNaN: true }),
    basis: fc.constantFrom('phr' as const, 'wtPctOfSlurry' as const)
  });

  it('every line within one step of the exact mass; lines sum to the batch', () => {
    let planned = 0;
    fc.assert(
      fc.property(cases, ({ wt, ratio, resIndex, massFraction, basis }) => {
        const res = resolutions[resIndex];
        const places = Math.max(0, -Math.round(Math.log10(res)));
        // 2 g – 50 kg, a whole number of balance steps.
        const minSteps = Math.ceil(2 / res);
        const steps = minSteps + Math.floor(massFraction * (Math.round(50_000 / res) - minSteps));
        const massText = (BigInt(steps) * 10n ** BigInt(4 - places)).toString().padStart(5, '0');
        const massG = Number(`${massText.slice(0, -4)}.${massText.slice(-4)}`);
        const p = plan(revision(wt, ratio), request(basis, massG, res, wt.length));
        const exact = exactMasses(wt, ratio, dec(massG));
        if ('errors' in p) {
          // Only a line lighter than one balance step may refuse the plan (minimum weight).
          expect(exact.some((m) => m.n * dec(res).d < dec(res).n * m.d)).toBe(true);
          return;
        }
        planned++;
        expectExact(p, exact, dec(massG), dec(res));
      }),
      { numRuns: 400 }
    );
    expect(planned).toBeGreaterThan(200);
  });
});

describe('an exact loading that disagrees with its print is refused', () => {
  it('throws the bad-number error rather than weighing either value', () => {
    const built = weighoutInputFromRevision(revision([15.14, 2.65], [1, 1]), request('phr', 100, 0.001, 2));
    if (!built.ok) throw new Error('plan refused');
    expect(built.input.phosphors[0].pctExact).toBe('151400/8221'); // 1514/82.21 written as a fraction
    const tampered = { ...built.input, phosphors: built.input.phosphors.map((p, i) => (i === 0 ? { ...p, pct: 18.5 } : p)) };
    expect(() => computeWeighout(tampered)).toThrow(/does not match its printed value/);
  });
});
