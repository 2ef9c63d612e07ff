// Bundles the worker threads next to the built app, run after `vite build`: the solver's (build/solve-worker.js)
// and the measurement reader's (build/measure-worker.js).
import { build } from 'esbuild';

const common = { bundle: true, platform: 'node', format: 'esm', target: 'node20', logLevel: 'warning' };
await build({ ...common, entryPoints: ['src/lib/server/solver/worker.ts'], outfile: 'build/solve-worker.js' });
await build({ ...common, entryPoints: ['src/lib/server/measurements/read-worker.ts'], outfile: 'build/measure-worker.js' });
