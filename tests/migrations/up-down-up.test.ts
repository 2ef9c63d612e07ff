import { afterAll, describe, expect, it } from 'vitest';
import knexFactory, { type Knex } from 'knex';
import config from '../../knexfile';

// Migrations must apply, roll back completely, and apply again on the real MariaDB.
// Runs in a scratch database beside the test database so the seeded data stays untouched.
const base = config.development.connection as Knex.MySql2ConnectionConfig;
const scratch = `${base.database}_migrations`;
const admin = knexFactory({ client: 'mysql2', connection: { ...base, database: undefined } });
// Knex's own loader cannot import .ts inside Vitest, so the migration files are handed over through Vite.
const files = import.meta.glob<Knex.Migration>('../../migrations/*.ts');
const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(files).sort(),
  getMigrationName: (path) => path.split('/').pop()!,
  getMigration: (path) => files[path]()
};
const knex = knexFactory({ client: 'mysql2', connection: { ...base, database: scratch }, migrations: { migrationSource } });

async function tables(): Promise<string[]> {
  const [rows] = await knex.raw('SHOW TABLES');
  return (rows as Record<string, string>[]).map((r) => Object.values(r)[0]).filter((t) => !t.startsWith('knex_')).sort();
}

describe('migrations up → down → up', () => {
  afterAll(async () => {
    await knex.destroy();
    await admin.raw(`DROP DATABASE IF EXISTS \`${scratch}\``);
    await admin.destroy();
  });

  it('leaves the same schema after a full round trip', async () => {
    await admin.raw(`DROP DATABASE IF EXISTS \`${scratch}\``);
    await admin.raw(`CREATE DATABASE \`${scratch}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    await knex.migrate.latest();
    const first = await tables();
    expect(first).toContain('users');
    expect(first).toContain('audit_events');
    await knex.migrate.rollback(undefined, true);
    expect(await tables()).toEqual([]);
    await knex.migrate.latest();
    expect(await tables()).toEqual(first);
  }, 180_000);

  it('refuses UPDATE and DELETE on the audit trail', async () => {
    await knex('audit_events').insert({ entity_type: 'probe', action: 'create' });
    await expect(knex('audit_events').update({ action: 'changed' })).rejects.toThrow(/append-only/);
    await expect(knex('audit_events').delete()).rejects.toThrow(/append-only/);
  });
});
