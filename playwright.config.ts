import { defineConfig } from '@playwright/test';
import { externalDatabaseRefusal } from './scripts/guard-test-database.mjs';

// The app under test writes to its database: never one the tests did not create (see the guard).
const refusal = externalDatabaseRefusal(process.env);
if (refusal) throw new Error(`playwright: ${refusal}`);

// Ports and service settings come from scripts/profile.sh (PF_PROFILE=test), which `npm test` sources.
const PORT = Number(process.env.PORT ?? 4173);
const ORIGIN = `http://127.0.0.1:${PORT}`;

export default defineConfig({
  testDir: 'tests/e2e',
  testMatch: /.*\.e2e\.ts/,
  workers: 1,
  reporter: 'list',
  timeout: 60_000,
  use: {
    baseURL: ORIGIN,
    browserName: 'chromium',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run'
      ]
    }
  },
  webServer: {
    command: 'node build',
    url: `${ORIGIN}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    env: {
      PORT: String(PORT),
      HOST: '127.0.0.1',
      ORIGIN,
      AUTH_SECRET: process.env.AUTH_SECRET ?? 'test-secret-phosforge-at-least-32-characters-long'
    }
  }
});
