import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { closeDb, db } from '../../src/lib/server/db/index';

// The schema and the code must meet Galera's requirements (MariaDB Galera Cluster "Known
// Limitations"; common practice): every table InnoDB with a primary key (rows without one cannot be
// certified or applied in parallel), and no LOCK TABLES / GET_LOCK (not replicated between nodes).
afterAll(closeDb);

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? files(p) : /\.(ts|svelte)$/.test(f) ? [p] : [];
  });
}

describe('Galera readiness of the schema and the code', () => {
  it('every table is InnoDB and has a primary key', async () => {
    const [rows] = await db().raw(
      `SELECT t.table_name AS name, t.engine AS engine,
              (SELECT COUNT(*) FROM information_schema.table_constraints c
                WHERE c.table_schema = t.table_schema AND c.table_name = t.table_name AND c.constraint_type = 'PRIMARY KEY') AS pk
         FROM information_schema.tables t
        WHERE t.table_schema = DATABASE() AND t.table_type = 'BASE TABLE'`
    );
    const tables = rows as { name: string; engine: string; pk: number }[];
    expect(tables.length).toBeGreaterThan(20);
    expect(tables.filter((t) => t.engine !== 'InnoDB').map((t) => `${t.name} (${t.engine})`)).toEqual([]);
    expect(tables.filter((t) => Number(t.pk) === 0).map((t) => t.name)).toEqual([]);
  });

  it('no code takes table locks or named locks', () => {
    const offenders = [...files('src'), ...files('migrations'), ...files('seeds')].filter((f) =>
      /\bLOCK\s+TABLES?\b|\bGET_LOCK\s*\(/i.test(readFileSync(f, 'utf8'))
    );
    expect(offenders).toEqual([]);
  });
});
