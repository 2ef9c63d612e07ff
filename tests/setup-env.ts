import { externalDatabaseRefusal } from '../scripts/guard-test-database.mjs';

// Never a database the tests did not create: DATABASE_URL only when PF_TEST_DATABASE_URL repeats it.
const refusal = externalDatabaseRefusal(process.env);
if (refusal) throw new Error(`vitest: ${refusal}`);

// Test runs default to the test profile's database and services (scripts/profile.sh, PF_PROFILE=test),
// so a stray `npx vitest` never touches the development database.
const defaults: Record<string, string> = {
  DB_HOST: '127.0.0.1',
  DB_PORT: '33307',
  DB_NAME: 'phosforge_test',
  DB_USER: 'phosforge',
  DB_PASSWORD: 'phosforge-local',
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: '2526',
  MAIL_INBOX_URL: 'http://127.0.0.1:2581',
  S3_ENDPOINT: 'http://127.0.0.1:4570',
  S3_BUCKET: 'phosforge-files',
  AUTH_SECRET: 'test-secret-phosforge-at-least-32-characters-long'
};
// Variables already set (npm test, scripts/sandbox.sh) win over these defaults.
for (const [k, v] of Object.entries(defaults)) process.env[k] ??= v;
