import { sveltekit } from '@sveltejs/kit/vite';
import { configDefaults, defineConfig } from 'vitest/config';

export default defineConfig({
  plugins: [sveltekit()],
  // The designer's spread worker is an ES module (new Worker(…, { type: 'module' })).
  worker: { format: 'es' },
  test: {
    include: ['tests/**/*.test.ts'],
    // The Galera fault suites need the three-node cluster: `npm run test:cluster` (vitest.cluster.config.ts).
    exclude: [...configDefaults.exclude, 'tests/cluster/**'],
    setupFiles: ['tests/setup-env.ts'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // Integration tests share one database: run files one after another.
    fileParallelism: false
  }
});
