/**
 * `npm run storage:sweep [-- --remove] [--older-than-hours N]`: compares the object store with the
 * stored_files table. Reports objects without a row (orphans, e.g. an upload whose process died
 * before its row committed) and rows without an object (lost files). Orphans older than N hours
 * (default 24) are removed only with --remove. Exits 1 when a row's object is missing.
 */
import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import knexFactory from 'knex';
import { z } from 'zod';
import { connectionFromEnv } from '../../knexfile';
import { bucketFromEnv, s3FromEnv } from './s3';
import { sweepStorage } from '../../src/lib/server/storage/sweep';

const argsSchema = z.object({
  remove: z.boolean(),
  olderThanHours: z.number('--older-than-hours needs a number of hours').min(0, '--older-than-hours must be 0 or more').max(24 * 365)
});

function parseArgs(argv: string[]) {
  let remove = false;
  let olderThanHours: unknown = 24;
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === '--remove') remove = true;
    else if (argv[i] === '--older-than-hours') olderThanHours = Number(argv[++i]);
    else throw new Error(`storage:sweep: unknown argument "${argv[i]}" (use --remove, --older-than-hours N)`);
  }
  const parsed = argsSchema.safeParse({ remove, olderThanHours });
  if (!parsed.success) throw new Error(`storage:sweep: ${parsed.error.issues.map((i) => i.message).join('; ')}`);
  return parsed.data;
}

let args: ReturnType<typeof parseArgs>;
try {
  args = parseArgs(process.argv.slice(2));
} catch (err) {
  console.error((err as Error).message);
  process.exit(2);
}
const knex = knexFactory({ client: 'mysql2', connection: connectionFromEnv() });
const s3 = s3FromEnv();
const Bucket = bucketFromEnv();
try {
  const r = await sweepStorage(knex, s3, Bucket, {
    olderThanMs: args.olderThanHours * 3_600_000,
    remove: args.remove,
    deleteObject: async (Key) => { await s3.send(new DeleteObjectCommand({ Bucket, Key })); }
  });
  const bytes = r.orphans.reduce((a, o) => a + o.bytes, 0);
  console.log(`storage:sweep: ${r.objects} objects, ${r.rows} stored-file rows`);
  console.log(`  orphans older than ${args.olderThanHours} h: ${r.orphans.length} (${bytes} bytes)${args.remove ? `, removed ${r.removed}` : ' — run with --remove to delete them'}`);
  for (const o of r.orphans.slice(0, 20)) console.log(`    ${o.key} (${o.bytes} bytes, ${o.lastModified})`);
  if (r.recentUnreferenced) console.log(`  newer objects without a row (left alone, may be uploads in flight): ${r.recentUnreferenced}`);
  console.log(`  rows whose object is missing: ${r.missing.length}`);
  for (const m of r.missing.slice(0, 20)) console.log(`    stored_files #${m.id} ${m.purpose} ${m.key}`);
  process.exitCode = r.missing.length ? 1 : 0;
} finally {
  await knex.destroy();
}
