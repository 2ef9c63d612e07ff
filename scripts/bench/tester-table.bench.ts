/**
 * Tester-table benchmark (run: npx tsx scripts/bench/tester-table.bench.ts): a lot of 100,000 parts from an
 * inline tester's per-part table (label, x, y, CCT, Ra, R9, flux, Vf, bin; about 6 MB) read with a profile,
 * turned into part metrics, judged against a 3000 K revision (3-step ellipse, Ra ≥ 80, R9 ≥ 0, ANSI bin)
 * and summarised with the plot model — the pure part of "upload to summary" (the database insert is
 * timed by the upload integration test). Then the server's path: the same table gzip-compressed, read in a
 * worker thread (the bundle `npm run build` makes, built here by esbuild) — unpacked, decoded and parsed as
 * it streams — timed to the result in this thread, with the longest stall of this thread's event loop.
 * Parts invented: a normal spread around the 3000 K centre.
 */
import { chromaticityPlotModel, defaultAcceptance, judgeBatch } from '../../src/lib/measurements/index';
import { parseTesterTable } from '../../src/lib/tester-table/parse';
import { testerPartMetrics } from '../../src/lib/tester-table/part-metrics';
import { testerProfileSchema } from '../../src/lib/tester-table/profile';
import { seededRandom } from '../../src/lib/blend/spread/prng';
import { gzipSync } from 'node:zlib';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'esbuild';
import { readOn, startReader } from '../../src/lib/server/measurements/read-pool';

const PARTS = 100_000;
const RUNS = 3;
const rnd = seededRandom(7);
const gauss = () => Math.sqrt(-2 * Math.log(1 - rnd.next())) * Math.cos(2 * Math.PI * rnd.next());
const lines = ['Serial,x,y,CCT,Ra,R9,Flux (lm),Vf (V),Bin'];
for (let i = 0; i < PARTS; i++) {
  const x = 0.4338 + 0.002 * gauss();
  const y = 0.403 + 0.0015 * gauss();
  lines.push(
    `KH-${String(i + 1).padStart(6, '0')},${x.toFixed(5)},${y.toFixed(5)},${Math.round(3000 - 30000 * (x - 0.4338))},` +
      `${(82 + gauss()).toFixed(1)},${(12 + 4 * gauss()).toFixed(1)},${(118 + 3 * gauss()).toFixed(1)},` +
      `${(2.9 + 0.03 * gauss()).toFixed(3)},A${i % 4}`
  );
}
const text = lines.join('\n');
const profile = testerProfileSchema.parse({
  name: 'bench',
  headerLines: 0,
  delimiter: ',',
  decimalMark: '.',
  chromaticity: 'xy',
  columns: { label: 'Serial', x: 'x', y: 'y', cct: 'CCT', ra: 'Ra', r9: 'R9', flux: 'Flux (lm)', forwardVoltage: 'Vf (V)', bin: 'Bin' }
});
const target = { kind: 'ansiBin', nominalCct: 3000 } as const;
const acceptance = defaultAcceptance({ target, tolerance: { kind: 'sdcm', steps: 3 }, floors: { raMin: 80, r9Min: 0 } });

console.log(`tester-table  ${PARTS.toLocaleString('en')} rows, ${(text.length / 1024 / 1024).toFixed(1)} MB`);
const times: Record<string, number[]> = { parse: [], metrics: [], judge: [], plot: [], total: [] };
let yieldFraction = 0;
for (let run = 0; run < RUNS; run++) {
  const t0 = performance.now();
  const parsed = parseTesterTable(text, profile);
  if (!parsed.ok) throw new Error(parsed.errors[0].message);
  const t1 = performance.now();
  const parts = parsed.rows.map((r) => ({ label: r.label, metrics: testerPartMetrics(r, 'xy') }));
  const t2 = performance.now();
  const batch = judgeBatch(parts, target, acceptance);
  const t3 = performance.now();
  chromaticityPlotModel(batch);
  const t4 = performance.now();
  yieldFraction = batch.summary.yieldFraction ?? 0;
  times.parse.push(t1 - t0);
  times.metrics.push(t2 - t1);
  times.judge.push(t3 - t2);
  times.plot.push(t4 - t3);
  times.total.push(t4 - t0);
}
const median = (a: number[]) => [...a].sort((p, q) => p - q)[Math.floor(a.length / 2)];
for (const [k, v] of Object.entries(times)) console.log(`tester-table  ${k.padEnd(8)} median ${median(v).toFixed(0).padStart(6)} ms`);
console.log(
  `tester-table  yield ${(yieldFraction * 100).toFixed(1)} %; heap ${(process.memoryUsage().heapUsed / 1024 / 1024).toFixed(0)} MB`
);
console.log(
  JSON.stringify({
    bench: 'tester-table',
    unit: 'ms',
    parts: PARTS,
    medians: Object.fromEntries(Object.entries(times).map(([k, v]) => [k, Number(median(v).toFixed(0))]))
  })
);

// The worker path: gzip body → worker (stream unpack, decode, parse, metrics) → parts back here.
const workerFile = join(tmpdir(), `measure-worker-bench-${process.pid}.mjs`);
const esm = { bundle: true, platform: 'node', format: 'esm', target: 'node20', logLevel: 'warning' } as const;
await build({ ...esm, entryPoints: ['src/lib/server/measurements/read-worker.ts'], outfile: workerFile });
const slot = startReader(workerFile);
const gz = new Uint8Array(gzipSync(text));
const job = { kind: 'table' as const, name: 'lot.csv.gz', body: gz, profile: { id: 1, version: 1, profile } };
const worker: number[] = [];
let stall = 0;
for (let run = 0; run < RUNS + 1; run++) {
  let last = performance.now();
  let longest = 0;
  const tick = setInterval(() => {
    const now = performance.now();
    longest = Math.max(longest, now - last);
    last = now;
  }, 5);
  const t0 = performance.now();
  const r = await readOn(slot, job);
  const t1 = performance.now();
  clearInterval(tick);
  if (r.parts.length !== PARTS) throw new Error(`worker read ${r.parts.length} parts`);
  if (run > 0) worker.push(t1 - t0); // the first run warms the thread up
  stall = Math.max(stall, longest);
}
await slot.worker.terminate();
console.log(
  `tester-table  worker   median ${median(worker).toFixed(0).padStart(6)} ms (gzip ${(gz.length / 1024 / 1024).toFixed(1)} MB in, ` +
    `parts back); longest stall of this thread ${stall.toFixed(0)} ms; peak RSS of the process ` +
    `${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB`
);
console.log(
  JSON.stringify({
    bench: 'tester-table-worker',
    unit: 'ms',
    parts: PARTS,
    median: Number(median(worker).toFixed(0)),
    stall: Number(stall.toFixed(0))
  })
);
