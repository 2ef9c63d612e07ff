import { defineConfig } from '@playwright/test';
import base from './playwright.config';

// `npm run tour`: the screenshots of the README's tour (docs/tour), taken from a seeded sandbox. Not part of `npm test`.
export default defineConfig({ ...base, testDir: 'tests/tour', testMatch: /.*\.tour\.ts/ });
