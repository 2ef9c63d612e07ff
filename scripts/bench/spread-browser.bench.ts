/// <reference types="node" />
/**
 * Production-spread benchmark in the browser (run: npx tsx scripts/bench/spread-browser.bench.ts): the
 * designer's cloud job for 10,000 parts of the 3-phosphor demo recipe, bundled with esbuild and timed in
 * headless Chromium (Debian's /usr/bin/chromium, as the browser tests use). Budget: ≤ 1 s.
 * Skipped, saying so, when Chromium is not installed.
 */
import { existsSync } from 'node:fs';
import { build } from 'esbuild';
import { chromium } from '@playwright/test';

const PARTS = 10_000;
const RUNS = 5;
const BUDGET_MS = 1000;
const CHROMIUM = '/usr/bin/chromium';

if (!existsSync(CHROMIUM)) {
  console.log(`spread-browser  skipped: ${CHROMIUM} is not installed`);
  process.exit(0);
}
const bundle = await build({
  entryPoints: ['scripts/bench/browser/spread-entry.ts'],
  bundle: true,
  format: 'iife',
  write: false,
  platform: 'browser'
});
const browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--headless', '--no-sandbox', '--disable-gpu'] });
try {
  const page = await browser.newPage();
  await page.setContent('<!doctype html><title>spread bench</title>');
  await page.addScriptTag({ content: bundle.outputFiles[0].text });
  const r = await page.evaluate(([parts, runs]) => window.phosforgeSpreadBench(parts, runs), [PARTS, RUNS] as const);
  const version = browser.version();
  console.log(
    `spread-browser  ${PARTS} parts + figures in Chromium ${version}  median ${r.medianMs.toFixed(1)} ms` +
      `  (budget ${BUDGET_MS} ms${r.medianMs <= BUDGET_MS ? ', ok' : ', OVER'})`
  );
  console.log(`spread-browser  runs ${r.runsMs.map((t) => t.toFixed(0)).join(', ')} ms; mean steps ${r.meanSteps.toFixed(2)}`);
  console.log(
    JSON.stringify({
      bench: 'spread-browser',
      unit: 'ms',
      parts: PARTS,
      chromium: version,
      medians: { cloud10k: Number(r.medianMs.toFixed(1)) }
    })
  );
} finally {
  await browser.close();
}
