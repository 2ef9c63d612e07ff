/**
 * Backup → restore round trip on the real MariaDB and the S3 fake: the backup of the test database
 * is restored into a second database and bucket, and every table's rows and checksum and every
 * object's bytes must match.
 */
import { execFile } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import knexFactory, { type Knex } from 'knex';
import { connectionFromEnv } from '../../knexfile';
import { s3FromEnv, bucketFromEnv } from '../../scripts/backup/s3';

const run = promisify(execFile);
const restoreDb = `${process.env.DB_NAME}_restore`;
const restoreBucket = 'phosforge-restore-check';
let dir = '';
let source: Knex;
let target: Knex;

async function tableChecksums(k: Knex): Promise<Record<string, string>> {
  const [tables] = await k.raw(
    'SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ' +
      'DATABASE() AND table_type = "BASE TABLE" ORDER BY table_name'
  );
  const out: Record<string, string> = {};
  for (const { t } of tables as { t: string }[]) {
    const [[c]] = await k.raw('SELECT COUNT(*) AS n FROM ??', [t]);
    const [[s]] = await k.raw('CHECKSUM TABLE ??', [t]);
    out[t] = `${c.n}:${s.Checksum}`;
  }
  return out;
}

describe('npm run backup / npm run restore', () => {
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'phosforge-backup-'));
    source = knexFactory({ client: 'mysql2', connection: connectionFromEnv() });
    await source.raw(`CREATE DATABASE IF NOT EXISTS \`${restoreDb}\``);
    target = knexFactory({ client: 'mysql2', connection: { ...connectionFromEnv(), database: restoreDb } });
    // Something recognisable in both stores: a sign-in attempt row (ordinary table) and an object.
    await source('sign_in_attempts').insert({ email: 'backup.marker@kestrelhollow.example', succeeded: false, ip: '127.0.0.1' });
    await s3FromEnv().send(
      new PutObjectCommand({ Bucket: bucketFromEnv(), Key: 'backup-check/marker.txt', Body: 'Kestrel Hollow backup marker ✓' })
    );
  });

  afterAll(async () => {
    await source('sign_in_attempts').where({ email: 'backup.marker@kestrelhollow.example' }).delete();
    await source.raw(`DROP DATABASE IF EXISTS \`${restoreDb}\``);
    await Promise.all([source.destroy(), target.destroy()]);
    rmSync(dir, { recursive: true, force: true });
  });

  it('restores every table, row, trigger and object exactly', async () => {
    const backup = await run('node', ['--import', 'tsx', 'scripts/backup/backup.ts', dir], { env: process.env });
    expect(backup.stdout).toMatch(/backup: .* tables, \d+ rows, \d+ objects/);
    const restore = await run('node', ['--import', 'tsx', 'scripts/backup/restore.ts', dir, '--yes'], {
      env: { ...process.env, DB_NAME: restoreDb, S3_BUCKET: restoreBucket }
    });
    expect(restore.stdout).toMatch(/restored/);

    expect(await tableChecksums(target)).toEqual(await tableChecksums(source));
    const [triggers] = await target.raw(
      'SELECT trigger_name AS n FROM information_schema.triggers WHERE trigger_schema = DATABASE() ORDER BY n'
    );
    expect((triggers as { n: string }[]).map((r) => r.n)).toEqual(
      expect.arrayContaining(['audit_events_no_delete', 'audit_events_no_update'])
    );
    const obj = await s3FromEnv().send(new GetObjectCommand({ Bucket: restoreBucket, Key: 'backup-check/marker.txt' }));
    expect(await obj.Body!.transformToString()).toBe('Kestrel Hollow backup marker ✓');
  }, 180_000);

  it('writes the backup owner-only (folders 0700, files 0600) even under umask 000', async () => {
    // The dump holds password hashes; a world-readable backup leaks them (common practice: 0700/0600).
    const loose = join(dir, 'under-umask-000');
    await run('sh', ['-c', 'umask 000 && exec node --import tsx scripts/backup/backup.ts "$0"', loose], { env: process.env });
    const modes: string[] = [];
    const walk = (p: string): void => {
      const st = statSync(p);
      modes.push(`${p.slice(loose.length) || '/'} ${(st.mode & 0o777).toString(8)}`);
      if (st.isDirectory()) for (const e of readdirSync(p)) walk(join(p, e));
    };
    walk(loose);
    expect(modes).toContain('/database.sql 600');
    expect(modes).toContain('/manifest.json 600');
    expect(modes).toContain('/objects/backup-check/marker.txt 600');
    for (const m of modes) expect(m).toMatch(/ (700|600)$/);
  }, 180_000);

  it('refuses a folder that is not a backup and changes nothing', async () => {
    await expect(
      run('node', ['--import', 'tsx', 'scripts/backup/restore.ts', tmpdir(), '--yes'], { env: { ...process.env, DB_NAME: restoreDb } })
    ).rejects.toMatchObject({ code: 2 });
  });
});
