import { defineConfig } from 'vitest/config';

// `npm run test:cluster` only (scripts/test-cluster.sh starts the three Galera nodes first): the fault
// suites run one after another, as each kills and restarts nodes of the one cluster.
export default defineConfig({
  test: {
    include: ['tests/cluster/**/*.test.ts'],
    setupFiles: ['tests/setup-env.ts'],
    environment: 'node',
    testTimeout: 240_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    sequence: { shuffle: false }
  }
});
