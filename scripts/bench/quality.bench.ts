/**
 * Quality benchmark (run: npx tsx scripts/bench/quality.bench.ts).
 * A batch of 500 parts measured at 1 nm (380–780 nm) in one multi-column export, summarised the
 * way an upload is: parse (the shared spectrum-file parser) → every metric per part (CIE 15,
 * Ohno 2014, CIE 13.3, CIE 224/TM-30, LER) → ANSI bin, steps, pass/fail → batch summary,
 * histograms and plot model. Budget: 500 parts ≤ 2000 ms on the 2-core development machine.
 * Then 10,000 spectra (401 points each) with every metric through `measureParts`, in uploads of the
 * largest size it takes (MAX_PARTS_PER_UPLOAD); budget 2000 ms.
 * Parts are synthetic (src/lib/measurements/syntheticParts.ts): the demo blend solved for the 3000 K bin,
 * red 2 % high, ±3 % scatter per phosphor (invented).
 */
import { BLUE_PUMP, demoPhosphor } from '../../src/lib/blend/demo-components';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { parseSpectrumFile } from '../../src/lib/spectrum-file/parse';
import { chromaticityPlotModel, defaultAcceptance, judgeBatch, MAX_PARTS_PER_UPLOAD, measureParts } from '../../src/lib/measurements/index';
import { syntheticPartSpectra, syntheticPartsCsv } from '../../src/lib/measurements/syntheticParts';
import { MAX_MEASUREMENT_FILE_BYTES } from '../../src/lib/measurements/schema';

const PARTS = 500;
const RUNS = 5;
const BUDGET_MS = 2000;

const components = { pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yg555', 'ph-rd625'].map(demoPhosphor) };
const fractions = solveBlend({ components, target: { kind: 'ansiBin', nominalCct: 3000 }, floors: { raMin: 90 }, objective: 'maxLer' })
  .candidates[0].opticalFractions;
const text = syntheticPartsCsv(components, fractions, { parts: PARTS, prefix: 'KH-P', lastPhosphorScale: 1.02, scatter: 0.03 });
const target = { kind: 'ansiBin', nominalCct: 3000 } as const;
const acceptance = defaultAcceptance({ target, tolerance: { kind: 'sdcm', steps: 3 }, floors: { raMin: 90 } });

console.log(`quality  export: ${PARTS} parts × 401 points, ${(text.length / 1024 / 1024).toFixed(2)} MB`);
const times: Record<string, number[]> = { parse: [], measure: [], judge: [], plot: [], total: [] };
let yieldFraction = 0;
for (let run = 0; run < RUNS; run++) {
  const t0 = performance.now();
  const parsed = parseSpectrumFile(text, { multiColumn: true, maxBytes: MAX_MEASUREMENT_FILE_BYTES });
  if (!parsed.ok) throw new Error(parsed.errors[0].message);
  const t1 = performance.now();
  const measured = measureParts(parsed);
  if (!measured.ok) throw new Error(measured.errors[0].message);
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
const SPECTRA = 10_000;
const SPECTRA_BUDGET_MS = 2000;
const wavelengths = Array.from({ length: 401 }, (_, i) => 380 + i);
const spectra = syntheticPartSpectra(components, fractions, { parts: SPECTRA, prefix: 'KH-Q', lastPhosphorScale: 1.02, scatter: 0.03 });
const uploads = Array.from({ length: Math.ceil(SPECTRA / MAX_PARTS_PER_UPLOAD) }, (_, u) => ({
  wavelengths,
  columns: spectra
    .slice(u * MAX_PARTS_PER_UPLOAD, (u + 1) * MAX_PARTS_PER_UPLOAD)
    .map((values, k) => ({ name: `KH-Q${u * MAX_PARTS_PER_UPLOAD + k + 1}`, values }))
}));
times.spectra10k = [];
for (let run = 0; run < 3; run++) {
  const t0 = performance.now();
  for (const upload of uploads) {
    const measured = measureParts(upload);
    if (!measured.ok) throw new Error(measured.errors[0].message);
  }
  times.spectra10k.push(performance.now() - t0);
}

const median = (a: number[]) => [...a].sort((p, q) => p - q)[Math.floor(a.length / 2)];
const out = Object.fromEntries(Object.entries(times).map(([k, v]) => [k, Number(median(v).toFixed(1))]));
for (const [k, v] of Object.entries(out)) if (k !== 'spectra10k') console.log(`quality  ${k.padEnd(8)} median ${v.toFixed(1)} ms`);
console.log(
  `quality  ${PARTS} parts summarised in ${out.total} ms (budget ${BUDGET_MS} ` +
    `ms${out.total <= BUDGET_MS ? ', ok' : ', OVER'}); yield ` +
    `${(yieldFraction * 100).toFixed(1)} %`
);
console.log(
  `quality  10,000 spectra with every metric: ${out.spectra10k} ms (budget ${SPECTRA_BUDGET_MS} ` +
    `ms${out.spectra10k <= SPECTRA_BUDGET_MS ? ', ok' : ', OVER'})`
);
console.log(JSON.stringify({ bench: 'quality', unit: 'ms', parts: PARTS, medians: out }));
