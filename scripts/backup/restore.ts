/**
 * Restore a backup made by backup.ts into the configured database and bucket: every existing table
 * of the target database is dropped first (the dump re-creates schema, data and triggers), then the
 * objects are uploaded again and their SHA-256 checked against the manifest.
 * Usage: node --import tsx scripts/backup/restore.ts <dir> [--yes]   (without --yes it only checks the folder)
 */
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { createReadStream, existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { CreateBucketCommand, HeadBucketCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import knexFactory from 'knex';
import { connectionFromEnv } from '../../knexfile';
import { bucketFromEnv, s3FromEnv } from './s3';

const dir = process.argv[2] ? resolve(process.argv[2]) : '';
const yes = process.argv.includes('--yes');
if (!dir || !existsSync(join(dir, 'manifest.json')) || !existsSync(join(dir, 'database.sql'))) {
  console.error('restore: give a backup folder holding manifest.json and database.sql');
  process.exit(2);
}
const manifest = JSON.parse(readFileSync(join(dir, 'manifest.json'), 'utf8')) as {
  rowCounts: Record<string, number>;
  objects: { key: string; bytes: number; sha256: string }[];
};
for (const o of manifest.objects) {
  const body = readFileSync(join(dir, 'objects', o.key));
  if (createHash('sha256').update(body).digest('hex') !== o.sha256) throw new Error(`restore: object ${o.key} does not match its checksum`);
}
const conn = connectionFromEnv();
if (!yes) {
  console.log(
    `restore: folder OK (${Object.keys(manifest.rowCounts).length} tables, ` +
      `${manifest.objects.length} objects). Re-run with --yes to replace database ` +
      `${conn.database} and bucket ${bucketFromEnv()}.`
  );
  process.exit(0);
}

const t0 = Date.now();
const knex = knexFactory({ client: 'mysql2', connection: { ...conn, multipleStatements: true } });
try {
  const [tables] = await knex.raw('SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE()');
  const names = (tables as { t: string }[]).map((r) => r.t);
  if (names.length)
    await knex.raw(
      `SET FOREIGN_KEY_CHECKS = 0; DROP TABLE IF EXISTS ${names.map((n) => `\`${n}\``).join(', ')}; SET FOREIGN_KEY_CHECKS = 1;`
    );
} finally {
  await knex.destroy();
}
await new Promise<void>((ok, fail) => {
  const p = spawn(
    'mariadb',
    [
      '--no-defaults',
      `--host=${conn.host}`,
      `--port=${conn.port}`,
      `--user=${conn.user}`,
      '--default-character-set=utf8mb4',
      String(conn.database)
    ],
    { env: { ...process.env, MYSQL_PWD: String(conn.password ?? '') }, stdio: ['pipe', 'inherit', 'pipe'] }
  );
  let err = '';
  p.stderr.on('data', (d) => (err += d));
  createReadStream(join(dir, 'database.sql')).pipe(p.stdin);
  p.on('error', fail);
  p.on('close', (code) => (code === 0 ? ok() : fail(new Error(`mariadb exited ${code}: ${err.trim()}`))));
});

const s3 = s3FromEnv();
const Bucket = bucketFromEnv();
try {
  await s3.send(new HeadBucketCommand({ Bucket }));
} catch {
  await s3.send(new CreateBucketCommand({ Bucket }));
}
for (const o of manifest.objects) {
  await s3.send(new PutObjectCommand({ Bucket, Key: o.key, Body: readFileSync(join(dir, 'objects', o.key)) }));
}
console.log(
  `restore: ${conn.database} and bucket ${Bucket} restored from ${dir} (${manifest.objects.length} objects) in ${Date.now() - t0} ms`
);
