/**
 * Consistent backup: `mariadb-dump --single-transaction` of the application database (one snapshot,
 * no locks on InnoDB tables) plus every object of the file bucket, into a new folder:
 *   <dir>/database.sql, <dir>/objects/<key>, <dir>/manifest.json (keys, sizes, SHA-256, row counts).
 * Usage: node --import tsx scripts/backup/backup.ts [<dir>]   (default backups/<UTC timestamp>)
 * The dump holds password hashes: the folder tree is created 0700 and every file 0600, whatever the umask.
 */
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { chmodSync, createWriteStream, mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import knexFactory from 'knex';
import { connectionFromEnv } from '../../knexfile';
import { bucketFromEnv, s3FromEnv } from './s3';
import { listObjects } from '../../src/lib/server/storage/list';

const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const dir = resolve(process.argv[2] ?? join('backups', stamp));
process.umask(0o077);
const PRIVATE_DIR = 0o700;
const PRIVATE_FILE = 0o600;
/** A folder only the owner can enter, also when it already existed or the umask was looser. */
function privateDir(path: string): void {
  mkdirSync(path, { recursive: true, mode: PRIVATE_DIR });
  chmodSync(path, PRIVATE_DIR);
}
privateDir(dir);
privateDir(join(dir, 'objects'));
const conn = connectionFromEnv();

async function dumpDatabase(): Promise<void> {
  const args = [
    '--no-defaults',
    `--host=${conn.host}`,
    `--port=${conn.port}`,
    `--user=${conn.user}`,
    '--single-transaction',
    '--quick',
    '--routines',
    '--triggers',
    '--hex-blob',
    '--default-character-set=utf8mb4',
    '--skip-add-locks',
    String(conn.database)
  ];
  await new Promise<void>((ok, fail) => {
    writeFileSync(join(dir, 'database.sql'), '', { mode: PRIVATE_FILE });
    chmodSync(join(dir, 'database.sql'), PRIVATE_FILE);
    const out = createWriteStream(join(dir, 'database.sql'));
    const p = spawn('mariadb-dump', args, {
      env: { ...process.env, MYSQL_PWD: String(conn.password ?? '') },
      stdio: ['ignore', 'pipe', 'pipe']
    });
    let err = '';
    p.stderr.on('data', (d) => (err += d));
    p.stdout.pipe(out);
    p.on('error', fail);
    p.on('close', (code) => out.end(() => (code === 0 ? ok() : fail(new Error(`mariadb-dump exited ${code}: ${err.trim()}`)))));
  });
}

async function rowCounts(): Promise<Record<string, number>> {
  const knex = knexFactory({ client: 'mysql2', connection: conn });
  try {
    const [tables] = await knex.raw(
      'SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ' +
        'DATABASE() AND table_type = "BASE TABLE" ORDER BY table_name'
    );
    const counts: Record<string, number> = {};
    for (const { t } of tables as { t: string }[]) {
      const [[row]] = await knex.raw('SELECT COUNT(*) AS n FROM ??', [t]);
      counts[t] = Number(row.n);
    }
    return counts;
  } finally {
    await knex.destroy();
  }
}

async function copyObjects(): Promise<{ key: string; bytes: number; sha256: string }[]> {
  const s3 = s3FromEnv();
  const Bucket = bucketFromEnv();
  const out: { key: string; bytes: number; sha256: string }[] = [];
  for (const { key } of await listObjects(s3, Bucket)) {
    const res = await s3.send(new GetObjectCommand({ Bucket, Key: key }));
    const body = Buffer.from(await res.Body!.transformToByteArray());
    const file = join(dir, 'objects', key);
    if (!file.startsWith(join(dir, 'objects'))) throw new Error(`refusing object key outside the backup folder: ${key}`);
    for (let d = dirname(file); d.startsWith(join(dir, 'objects')); d = dirname(d)) privateDir(d);
    writeFileSync(file, body, { mode: PRIVATE_FILE });
    chmodSync(file, PRIVATE_FILE);
    out.push({ key, bytes: body.length, sha256: createHash('sha256').update(body).digest('hex') });
  }
  return out;
}

const t0 = Date.now();
await dumpDatabase();
const counts = await rowCounts();
const objects = await copyObjects();
writeFileSync(
  join(dir, 'manifest.json'),
  JSON.stringify(
    { createdAt: new Date().toISOString(), database: conn.database, bucket: bucketFromEnv(), rowCounts: counts, objects },
    null,
    2
  ),
  { mode: PRIVATE_FILE }
);
chmodSync(join(dir, 'manifest.json'), PRIVATE_FILE);
const rows = Object.values(counts).reduce((a, b) => a + b, 0);
console.log(`backup: ${dir} — ${Object.keys(counts).length} tables, ${rows} rows, ${objects.length} objects, ${Date.now() - t0} ms`);
