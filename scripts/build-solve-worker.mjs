// Bundles the solver's worker thread next to the built app (build/solve-worker.js); run after `vite build`.
import { build } from 'esbuild';

await build({
  entryPoints: ['src/lib/server/solver/worker.ts'],
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  outfile: 'build/solve-worker.js',
  logLevel: 'warning'
});
