/**
 * Production-spread benchmark (run: npx tsx scripts/bench/spread.bench.ts).
 * 10,000 parts of a 3-phosphor recipe (demo blue pump + green, yellow-green, red solved for the 3000 K ANSI bin, Ra ≥ 90, on 0.3 mm)
 * with the default variation model, through the loading model, summarised into the yield figures.
 * Budget: 10,000 parts ≤ 500 ms on the 2-core development machine. Also times the variance breakdown
 * (the same run plus one run per source: 7 × 10,000 parts).
 */
import { BLUE_PUMP, demoPhosphor } from '../../src/lib/blend/demo-components';
import { prepareBasis } from '../../src/lib/blend/basis';
import { ansiQuadrangle, resolveTarget } from '../../src/lib/aim/target';
import { DEFAULT_VARIATION_MODEL, predictYield } from '../../src/lib/blend/spread';
import { concentrationsForFractions } from '../../src/lib/blend/loading/concentrationsForFractions';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';

const PARTS = 10_000;
const RUNS = 7;
const BUDGET_MS = 500;
const components = { pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yg555', 'ph-rd625'].map(demoPhosphor) };
const basis = prepareBasis(components).loading!;
const fractions = solveBlend({ components, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 90 }, objective: 'maxLer' })
  .candidates[0].opticalFractions;
const recipe = concentrationsForFractions(basis, fractions, { pathLengthMm: 0.3 });
const t = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
const input = {
  basis,
  concentrationsWtPct: recipe.concentrationsWtPct,
  pathLengthMm: 0.3,
  pumpPeakNm: 450,
  centre: { x: t.x, y: t.y, cct: t.cct },
  quadrangle: ansiQuadrangle(3000),
  tolerance: { kind: 'sdcm', steps: 3 } as const,
  model: DEFAULT_VARIATION_MODEL,
  parts: PARTS,
  seed: 1
};

function median(fn: () => void, runs: number): number {
  fn();
  const ts: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    ts.push(performance.now() - t0);
  }
  ts.sort((a, b) => a - b);
  return ts[Math.floor(ts.length / 2)];
}

const predict = median(() => predictYield({ ...input, breakdown: false }), RUNS);
const withBreakdown = median(() => predictYield({ ...input, breakdown: true }), 3);
const sample = predictYield({ ...input, breakdown: false }).figures;
console.log(
  `spread  ${PARTS} parts + figures      median ${predict.toFixed(1)} ms` +
    `  (budget ${BUDGET_MS} ms${predict <= BUDGET_MS ? ', ok' : ', OVER'})`
);
console.log(`spread  with variance breakdown (7 runs) median ${withBreakdown.toFixed(1)} ms`);
console.log(`spread  mean steps ${sample.meanSteps.toFixed(2)}, in 3-step ${(sample.inSteps[2].share * 100).toFixed(1)} %`);
console.log(
  JSON.stringify({
    bench: 'spread',
    unit: 'ms',
    parts: PARTS,
    medians: { predict10k: Number(predict.toFixed(1)), breakdown10k: Number(withBreakdown.toFixed(1)) }
  })
);
