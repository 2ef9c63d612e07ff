import { defineConfig } from '@playwright/test';
import base from './playwright.config';

// `npm run test:cluster`: the two-instance suite with instance A on Galera node 1 (DB_PORT from the
// cluster-test profile) and instance B on node 2 (PF_SECOND_DB_PORT), so every race crosses nodes.
export default defineConfig({ ...base, testMatch: /two-instances\.e2e\.ts/ });
