/// <reference types="node" />
/**
 * Bench of the spectral core: median time per spectrum on the 1 nm grid.
 *   npx tsx scripts/bench/spectral.bench.ts
 * Spectra: 200 synthetic pump + phosphor spectra (fixed seed), evaluated round-robin so caches
 * keyed on a single spectrum cannot help. Prints a table of medians and a final JSON line.
 * Budgets: cct+duv+cri ≤ 20 µs, tm30 ≤ 60 µs, α-opic ≤ 2 µs, evaluateSpectrum ≤ 85 µs.
 */
import {
  alphaOpicCieS026,
  criCie133,
  evaluateSpectrum,
  resampleToGrid,
  spdToXyz,
  tm30Cie224,
  uvToCctOhno2014,
  xyzToUv,
  type Spd
} from '../../src/lib/spectral/index';

let seed = 12345;
function rand(): number {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
}

function makeSpectrum(): Spd {
  const wavelengths = Array.from({ length: 401 }, (_, i) => 380 + i);
  const bands: [number, number, number][] = [
    [445 + 10 * rand(), 18 + 6 * rand(), 1],
    [530 + 30 * rand(), 60 + 50 * rand(), 0.8 + rand()],
    [610 + 40 * rand(), 60 + 40 * rand(), 0.3 + rand()]
  ];
  const values = wavelengths.map((l) => bands.reduce((s, [p, w, a]) => s + a * Math.exp(-0.5 * ((l - p) / (w / 2.3548)) ** 2), 0));
  return { wavelengths, values };
}

const spectra = Array.from({ length: 200 }, makeSpectrum);
const grids = spectra.map(resampleToGrid);
const ccts = grids.map((g) => uvToCctOhno2014(...xyzToUv(...spdToXyz(g))).cct);

function median(run: (i: number) => void, rounds = 15): number {
  const times: number[] = [];
  const n = spectra.length;
  for (let i = 0; i < n * 3; i++) run(i % n); // warm-up (JIT, lazy tables)
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    for (let i = 0; i < n; i++) run(i);
    times.push(((performance.now() - t0) * 1000) / n);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

let sink = 0;
const results: Record<string, number> = {
  'cct+duv': median((i) => {
    sink += uvToCctOhno2014(...xyzToUv(...spdToXyz(grids[i]))).cct;
  }),
  'cct+duv+cri': median((i) => {
    const { cct } = uvToCctOhno2014(...xyzToUv(...spdToXyz(grids[i])));
    sink += criCie133(grids[i], cct).ra;
  }),
  tm30: median((i) => {
    sink += tm30Cie224(grids[i], ccts[i]).rf;
  }),
  'alpha-opic (CIE S 026)': median((i) => {
    sink += alphaOpicCieS026(grids[i]).der.melanopic;
  }),
  'evaluate (fast: no cri, no tm30)': median((i) => {
    sink += evaluateSpectrum(spectra[i], { cri: false, tm30: false }).cct;
  }),
  'evaluate (no tm30)': median((i) => {
    sink += evaluateSpectrum(spectra[i], { tm30: false }).cct;
  }),
  evaluateSpectrum: median((i) => {
    sink += evaluateSpectrum(spectra[i]).tm30.rf;
  })
};

const budgets: Record<string, number> = { 'cct+duv+cri': 20, tm30: 60, 'alpha-opic (CIE S 026)': 2, evaluateSpectrum: 85 };
for (const [name, us] of Object.entries(results)) {
  const budget = budgets[name];
  const verdict = budget === undefined ? '' : us <= budget ? `  (budget ${budget} µs: ok)` : `  (budget ${budget} µs: OVER)`;
  console.log(`spectral  ${name.padEnd(34)} median ${us.toFixed(1).padStart(7)} µs${verdict}`);
}
console.log(
  JSON.stringify({
    bench: 'spectral',
    unit: 'us',
    node: process.version,
    medians: Object.fromEntries(Object.entries(results).map(([k, v]) => [k, Number(v.toFixed(1))])),
    sink: Number.isFinite(sink)
  })
);
