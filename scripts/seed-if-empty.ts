/** Seeds the demo data only into an empty database (no users yet); never touches existing data. */
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
} finally {
  await knex.destroy();
}
