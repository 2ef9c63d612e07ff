/**
 * Tester-table benchmark (run: npx tsx scripts/bench/tester-table.bench.ts): a lot of 100,000 parts from an
 * inline tester's per-part table (label, x, y, CCT, Ra, R9, flux, Vf, bin; about 6 MB) read with a profile,
 * turned into part metrics, judged against a 3000 K revision (3-step ellipse, Ra ≥ 80, R9 ≥ 0, ANSI bin)
 * and summarised with the plot model — the pure part of "upload to summary" (the database insert is
 * timed by `npm run bench:db`). Then the same file read in the request thread and in the reader worker thread
 * the built app uses, with the longest stall of the request thread's event loop during each.
 * Parts invented: a normal spread around the 3000 K centre.
 */
import { chromaticityPlotModel, defaultAcceptance, judgeBatch } from '../../src/lib/measurements/index';
import { parseTesterTable } from '../../src/lib/tester-table/parse';
import { testerPartMetrics } from '../../src/lib/tester-table/part-metrics';
import { testerProfileSchema } from '../../src/lib/tester-table/profile';
import { seededRandom } from '../../src/lib/blend/spread/prng';
import { readAndPack } from '../../src/lib/server/measurements/read-file';
import { readerPool, readOn } from '../../src/lib/server/measurements/read-pool';
import { build } from 'esbuild';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

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
// The reading step (unpack, decode, parse, part metrics) in this thread and in the reader thread, with the
// longest gap between timer ticks here (what other requests would wait) while it runs.
async function stalled(read: () => Promise<unknown>): Promise<{ ms: number; stallMs: number }> {
  let last = performance.now();
  let stall = 0;
  const tick = setInterval(() => {
    const now = performance.now();
    stall = Math.max(stall, now - last);
    last = now;
  }, 5);
  const t0 = performance.now();
  await read();
  const ms = performance.now() - t0;
  clearInterval(tick);
  return { ms, stallMs: Math.max(stall, performance.now() - last) };
}
const workerFile = join(tmpdir(), `measure-worker-bench-${process.pid}.mjs`);
const esm = { bundle: true, platform: 'node', format: 'esm', target: 'node20', logLevel: 'warning' } as const;
await build({ ...esm, entryPoints: ['src/lib/server/measurements/read-worker.ts'], outfile: workerFile });
const readers = readerPool(workerFile, 1);
const job = { kind: 'table' as const, name: 'lot.csv', body: new Uint8Array(Buffer.from(text)), profile: { id: 1, version: 1, profile } };
await readOn(readers, job); // warm the thread
const here = await stalled(() => readAndPack(job));
const there = await stalled(() => readOn(readers, job));
await readers.close();
console.log(`tester-table  read in this thread   ${here.ms.toFixed(0).padStart(6)} ms, event loop stalled ${here.stallMs.toFixed(0)} ms`);
console.log(`tester-table  read in reader thread ${there.ms.toFixed(0).padStart(6)} ms, event loop stalled ${there.stallMs.toFixed(0)} ms`);
console.log(
  JSON.stringify({
    bench: 'tester-table',
    read: {
      thread: Number(here.ms.toFixed(0)),
      worker: Number(there.ms.toFixed(0)),
      stallThread: Number(here.stallMs.toFixed(0)),
      stallWorker: Number(there.stallMs.toFixed(0))
    },
    unit: 'ms',
    parts: PARTS,
    medians: Object.fromEntries(Object.entries(times).map(([k, v]) => [k, Number(median(v).toFixed(0))]))
  })
);
