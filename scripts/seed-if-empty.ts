/**
 * Seeds the demo data only into an empty database (no users yet); never touches existing data.
 * A seed that fails stops the run (exit 1) with its reason: demo data is never skipped quietly.
 */
import knexFactory from 'knex';
import config from '../knexfile';

const knex = knexFactory(config.development);
try {
  const row = await knex('users').count<{ n: number }[]>('id as n').first();
  if (Number(row?.n ?? 0) > 0) {
    console.log('seed: database already holds data; demo seed skipped');
  } else {
    const [files] = await knex.seed.run();
    console.log(`seed: demo data loaded (${files.length} seed files)`);
  }
} catch (err) {
  console.error(`seed: FAILED: ${(err as Error).message}`);
  console.error('seed: the database may now hold part of the demo data; drop and re-create it before seeding again.');
  process.exitCode = 1;
} finally {
  await knex.destroy();
}
