/**
 * `npm run storage:sweep [-- --remove] [--older-than-hours N]`: compares the object store with the
 * stored_files table. Reports objects without a row (orphans, e.g. an upload whose process died
 * before its row committed) and rows without an object (lost files). Orphans older than N hours
 * (default 24) are removed only with --remove. Exits 1 when a row's object is missing.
 */
import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import { parseArgs } from 'node:util';
import knexFactory from 'knex';
import { z } from 'zod';
import { connectionFromEnv } from '../../knexfile';
import { bucketFromEnv, s3FromEnv } from './s3';
import { sweepStorage } from '../../src/lib/server/storage/sweep';

const argsSchema = z.object({
  remove: z.boolean(),
  olderThanHours: z
    .string()
    .regex(/^\d+(\.\d+)?$/, '--older-than-hours needs a number of hours (0 or more)')
    .transform(Number)
    .pipe(z.number().max(24 * 365, '--older-than-hours: at most a year'))
});

let args: z.infer<typeof argsSchema>;
try {
  const { values } = parseArgs({
    options: { remove: { type: 'boolean', default: false }, 'older-than-hours': { type: 'string', default: '24' } }
  });
  const parsed = argsSchema.safeParse({ remove: values.remove, olderThanHours: values['older-than-hours'] });
  if (!parsed.success) throw new Error(parsed.error.issues.map((i) => i.message).join('; '));
  args = parsed.data;
} catch (err) {
  console.error(`storage:sweep: ${(err as Error).message} (use --remove, --older-than-hours N)`);
  process.exit(2);
}
const knex = knexFactory({ client: 'mysql2', connection: connectionFromEnv() });
const s3 = s3FromEnv();
const Bucket = bucketFromEnv();
try {
  const r = await sweepStorage(knex, s3, Bucket, {
    olderThanMs: args.olderThanHours * 3_600_000,
    remove: args.remove,
    deleteObject: async (Key) => {
      await s3.send(new DeleteObjectCommand({ Bucket, Key }));
    }
  });
  const bytes = r.orphans.reduce((a, o) => a + o.bytes, 0);
  console.log(`storage:sweep: ${r.objects} objects, ${r.rows} stored-file rows`);
  console.log(
    `  orphans older than ${args.olderThanHours} h: ${r.orphans.length} (${bytes} ` +
      `bytes)${args.remove ? `, removed ${r.removed}` : ' — run with --remove to delete them'}`
  );
  for (const o of r.orphans.slice(0, 20)) console.log(`    ${o.key} (${o.bytes} bytes, ${o.lastModified})`);
  if (r.recentUnreferenced) console.log(`  newer objects without a row (left alone, may be uploads in flight): ${r.recentUnreferenced}`);
  console.log(`  rows whose object is missing: ${r.missing.length}`);
  for (const m of r.missing.slice(0, 20)) console.log(`    stored_files #${m.id} ${m.purpose} ${m.key}`);
  process.exitCode = r.missing.length ? 1 : 0;
} finally {
  await knex.destroy();
}
