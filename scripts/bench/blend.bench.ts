/**
 * Blend solver benchmark (run: npx tsx scripts/bench/blend.bench.ts).
 * Prints one line per case with the median wall time, then one JSON line.
 * Budgets: solve pump + 3 phosphors (Ra ≥ 90, R9 ≥ 50, max LER) ≤ 50 ms; pump + 4 ≤ 150 ms;
 * loading-model inverse for 5 phosphors ≤ 1 ms; solve with the loading model and re-absorption,
 * 3 phosphors, 5 proposals ≤ 150 ms; a 20-point LER–Rf trade-off front for 3 phosphors ≤ 1 s. Case keys as arguments run only those cases.
 */
import { BLUE_PUMP, demoPhosphor } from '../../src/lib/blend/demo-components';
import { prepareBasis } from '../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../src/lib/blend/loading/beerLambertPhotonBudget';
import { concentrationsForFractions } from '../../src/lib/blend/loading/concentrationsForFractions';
import { mix } from '../../src/lib/blend/mix';
import { solveBlend, type SolveProblem } from '../../src/lib/blend/solver/solveBlend';
import { traceTradeOff } from '../../src/lib/blend/solver/tradeOff';
import type { BlendComponents } from '../../src/lib/blend/types';

const comps = (...ids: string[]): BlendComponents => ({ pump: BLUE_PUMP, phosphors: ids.map(demoPhosphor) });
const THREE = comps('ph-gl530', 'ph-yg555', 'ph-rd625');
const FOUR = comps('ph-gl530', 'ph-yg555', 'ph-rd625', 'ph-rd650');
const FIVE = comps('ph-cg505', 'ph-gl530', 'ph-yg555', 'ph-rd625', 'ph-nr631');
const floors = { raMin: 90, r9Min: 50 };
const problem = (components: BlendComponents, nominalCct = 3000): SolveProblem => ({
  components,
  target: { kind: 'ansiBin', nominalCct },
  floors,
  objective: 'maxLer'
});

const FIVE_LOADING = prepareBasis(FIVE).loading!;
const FIVE_FRACTIONS = beerLambertPhotonBudget(FIVE_LOADING, [2, 5, 8, 3, 10], 0.3).opticalFractions;

function median(fn: () => void, runs: number, warmup = 3): number {
  for (let i = 0; i < warmup; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  t.sort((a, b) => a - b);
  return t[Math.floor(t.length / 2)];
}

const cases: { key: string; label: string; fn: () => void; runs: number; budgetMs?: number }[] = [
  { key: 'solve3', label: 'solve 3-phosphor', fn: () => solveBlend(problem(THREE)), runs: 31, budgetMs: 50 },
  { key: 'solve3at4000', label: 'solve 3-phosphor 4000K', fn: () => solveBlend(problem(THREE, 4000)), runs: 31 },
  { key: 'solve4', label: 'solve 4-phosphor', fn: () => solveBlend(problem(FOUR)), runs: 21, budgetMs: 150 },
  { key: 'solve5', label: 'solve 5-phosphor', fn: () => solveBlend(problem(FIVE)), runs: 11 },
  { key: 'mixOptical', label: 'mix optical', fn: () => mix(THREE, { kind: 'optical', fractions: [0.07, 0.19, 0.27, 0.47] }), runs: 51 },
  {
    key: 'mixLoadingCascade',
    label: 'mix loading+cascade',
    fn: () => mix(THREE, { kind: 'loading', concentrationsWtPct: [3, 6, 2], loading: { pathLengthMm: 0.3, cascade: true } }),
    runs: 51
  },
  {
    key: 'inverse5',
    label: 'inverse 5-phosphor',
    fn: () => concentrationsForFractions(FIVE_LOADING, FIVE_FRACTIONS, { pathLengthMm: 0.5 }),
    runs: 201,
    budgetMs: 1
  },
  {
    key: 'solve3Reabsorption',
    label: 'solve 3 re-absorption',
    fn: () => solveBlend({ ...problem(THREE), maxCandidates: 5, loading: { pathLengthMm: 0.3, cascade: true } }),
    runs: 21,
    budgetMs: 150
  },
  {
    key: 'tradeOff3Rf',
    label: 'trade-off 3, Rf, 20 pts',
    fn: () =>
      traceTradeOff({ components: THREE, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 80 }, metric: 'rf', points: 20 }),
    runs: 7,
    budgetMs: 1000
  },
  {
    key: 'tradeOff3Ra',
    label: 'trade-off 3, Ra, 20 pts',
    fn: () => traceTradeOff({ components: THREE, target: { kind: 'ansiBin', nominalCct: 3000 }, metric: 'ra', points: 20 }),
    runs: 7,
    budgetMs: 1000
  }
];

const out: Record<string, number> = {};
const only = process.argv.slice(2);
for (const c of cases.filter((k) => only.length === 0 || only.includes(k.key))) {
  const ms = median(c.fn, c.runs);
  out[c.key] = Number(ms.toFixed(2));
  const budget = c.budgetMs ? `  (budget ${c.budgetMs} ms${ms <= c.budgetMs ? ', ok' : ', OVER'})` : '';
  console.log(`blend  ${c.label.padEnd(24)} median ${ms.toFixed(1)} ms${budget}`);
}
console.log(JSON.stringify({ bench: 'blend', unit: 'ms', medians: out }));
