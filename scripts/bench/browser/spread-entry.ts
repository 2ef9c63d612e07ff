/**
 * Page script of the browser spread bench (bundled by spread-browser.bench.ts): the designer's cloud job
 * (`runSpreadJob`, what its web worker runs) for 10,000 parts of the 3-phosphor demo recipe of the
 * server bench, timed in the page. Exposes `phosforgeSpreadBench()` → median ms and the figures checked.
 */
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend/demo-components';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { ansiQuadrangle, resolveTarget } from '../../../src/lib/aim/target';
import { DEFAULT_VARIATION_MODEL } from '../../../src/lib/blend/spread';
import { concentrationsForFractions } from '../../../src/lib/blend/loading/concentrationsForFractions';
import { solveBlend } from '../../../src/lib/blend/solver/solveBlend';
import { runSpreadJob } from '../../../src/lib/designer/spread-cloud';

declare global {
  interface Window {
    phosforgeSpreadBench: (parts: number, runs: number) => { medianMs: number; runsMs: number[]; meanSteps: number };
  }
}

window.phosforgeSpreadBench = (parts, runs) => {
  const components = { pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yg555', 'ph-rd625'].map(demoPhosphor) };
  const basis = prepareBasis(components).loading!;
  const fractions = solveBlend({ components, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 90 }, objective: 'maxLer' })
    .candidates[0].opticalFractions;
  const wt = concentrationsForFractions(basis, fractions, { pathLengthMm: 0.3 }).concentrationsWtPct;
  const t = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
  const job = {
    id: 1,
    fractions,
    wtPct: wt,
    pathLengthMm: 0.3,
    centre: { x: t.x, y: t.y, cct: t.cct },
    quadrangle: ansiQuadrangle(3000),
    tolerance: { kind: 'sdcm', steps: 3 } as const,
    model: DEFAULT_VARIATION_MODEL,
    parts,
    seed: 1
  };
  let meanSteps = NaN;
  runSpreadJob(basis, job); // warm-up (JIT, lazy tables)
  const runsMs: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    const r = runSpreadJob(basis, job);
    runsMs.push(performance.now() - t0);
    if (r.ok) meanSteps = r.figures.meanSteps;
  }
  const sorted = [...runsMs].sort((a, b) => a - b);
  return { medianMs: sorted[Math.floor(sorted.length / 2)], runsMs, meanSteps };
};
