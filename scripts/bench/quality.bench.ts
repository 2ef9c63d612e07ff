/**
 * Quality benchmark (run: npx tsx scripts/bench/quality.bench.ts).
 * A batch of 500 parts measured at 1 nm (380–780 nm) in one multi-column export: build the CSV
 * text, then parse → every metric per part (CIE 15, Ohno 2014, CIE 13.3, CIE 224/TM-30, LER)
 * → ANSI bin, steps, pass/fail → batch summary, histograms and plot model.
 * Budget: the whole summary of 500 parts ≤ 2000 ms on the 2-core development machine.
 * Parts are synthetic: the demo blend solved for the 3000 K bin, each phosphor scattered ±3 % (invented).
 */
import { mix } from '../../src/lib/blend/mix';
import { BLUE_PUMP, demoPhosphor } from '../../src/lib/blend/demo-components';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { chromaticityPlotModel, judgeBatch, measureParts } from '../../src/lib/quality/index';
import { defaultAcceptance } from '../../src/lib/quality/judgeBatch';
import type { RevisionContent } from '../../src/lib/formulations/content';

const PARTS = 500;
const RUNS = 5;
const BUDGET_MS = 2000;

const components = { pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yg555', 'ph-rd625'].map(demoPhosphor) };
const base = solveBlend({ components, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 90 }, objective: 'maxLer' }).candidates[0].opticalFractions;
let seed = 12345;
const random = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);

function exportText(): string {
  const wavelengths = Array.from({ length: 401 }, (_, i) => 380 + i);
  const columns = Array.from({ length: PARTS }, () => {
    const fractions = base.map((f, i) => (i === 0 ? f : f * (1 + (random() - 0.5) * 0.06)));
    const spd = mix(components, { kind: 'optical', fractions }).spd;
    return wavelengths.map((w) => spd.values[w - spd.wavelengths[0]]);
  });
  const header = ['wavelength_nm', ...columns.map((_, i) => `KH-P${String(i + 1).padStart(4, '0')}`)].join(',');
  const rows = wavelengths.map((w, r) => [w, ...columns.map((c) => c[r].toPrecision(6))].join(','));
  return [header, ...rows].join('\n');
}

/** Columns of the export (the upload path uses the shared spectrum-file parser instead). */
function split(text: string) {
  const lines = text.split('\n');
  const names = lines[0].split(',').slice(1);
  const cells = lines.slice(1).map((l) => l.split(',').map(Number));
  return { wavelengths: cells.map((c) => c[0]), columns: names.map((name, k) => ({ name, values: cells.map((c) => c[k + 1]) })) };
}

const target = { kind: 'ansiBin', nominalCct: 3000 } as const;
const acceptance = defaultAcceptance({ target, tolerance: { kind: 'sdcm', steps: 5 }, floors: { raMin: 80, r9Min: 0 } } as Pick<RevisionContent, 'target' | 'tolerance' | 'floors'>);

const text = exportText();
console.log(`quality  export: ${PARTS} parts × 401 points, ${(text.length / 1024 / 1024).toFixed(2)} MB`);
const times: Record<string, number[]> = { parse: [], measure: [], judge: [], plot: [], total: [] };
let yieldFraction = 0;
for (let run = 0; run < RUNS; run++) {
  const t0 = performance.now();
  const cols = split(text);
  const t1 = performance.now();
  const measured = measureParts(cols);
  if (!measured.ok) throw new Error(JSON.stringify(measured.errors.slice(0, 3)));
  const t2 = performance.now();
  const batch = judgeBatch(measured.parts, target, acceptance);
  const t3 = performance.now();
  chromaticityPlotModel(batch);
  const t4 = performance.now();
  yieldFraction = batch.summary.yieldFraction ?? 0;
  times.parse.push(t1 - t0);
  times.measure.push(t2 - t1);
  times.judge.push(t3 - t2);
  times.plot.push(t4 - t3);
  times.total.push(t4 - t0);
}
const median = (a: number[]) => [...a].sort((p, q) => p - q)[Math.floor(a.length / 2)];
const out = Object.fromEntries(Object.entries(times).map(([k, v]) => [k, Number(median(v).toFixed(1))]));
for (const [k, v] of Object.entries(out)) console.log(`quality  ${k.padEnd(8)} median ${v.toFixed(1)} ms`);
console.log(`quality  500 parts summarised in ${out.total} ms (budget ${BUDGET_MS} ms${out.total <= BUDGET_MS ? ', ok' : ', OVER'}); yield ${(yieldFraction * 100).toFixed(1)} %`);
console.log(JSON.stringify({ bench: 'quality', unit: 'ms', parts: PARTS, medians: out }));
