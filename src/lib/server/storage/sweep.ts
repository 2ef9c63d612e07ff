/**
 * Reconciles the bucket with the stored_files table. An upload puts its object before the row
 * commits; if the process dies in between, the object has no row (an orphan). A row without its
 * object is a lost file. The sweep lists both: orphans older than a safety margin (so uploads in
 * flight are never touched) may be removed; missing objects are reported, never "fixed".
 */
import type { S3Client } from '@aws-sdk/client-s3';
import type { Knex } from 'knex';
import { listObjects } from './list';

export interface SweepOptions {
  /** Only objects last written longer ago than this count as orphans (default 24 h). */
  olderThanMs?: number;
  /** Remove the orphans (otherwise only report them). */
  remove?: boolean;
  /** Removes one object; the app passes its own delete (a missing object is not an error). */
  deleteObject: (key: string) => Promise<void>;
}

export interface SweepReport {
  objects: number;
  rows: number;
  orphans: { key: string; bytes: number; lastModified: string }[];
  /** Orphans too recent to judge (an upload may still be committing). */
  recentUnreferenced: number;
  removed: number;
  missing: { id: number; key: string; purpose: string }[];
}

export const DEFAULT_SWEEP_MARGIN_MS = 24 * 3_600_000;

export async function sweepStorage(knex: Knex, s3: S3Client, bucket: string, options: SweepOptions): Promise<SweepReport> {
  const margin = options.olderThanMs ?? DEFAULT_SWEEP_MARGIN_MS;
  // Objects first, rows second: a row committed between the two reads still protects its object.
  const objects = await listObjects(s3, bucket);
  const rows: { id: number; storage_key: string; purpose: string }[] = await knex('stored_files').select('id', 'storage_key', 'purpose');
  const referenced = new Set(rows.map((r) => r.storage_key));
  const present = new Set(objects.map((o) => o.key));
  const cutoff = Date.now() - margin;
  const unreferenced = objects.filter((o) => !referenced.has(o.key));
  const orphans = unreferenced.filter((o) => o.lastModified.getTime() <= cutoff);
  let removed = 0;
  if (options.remove) {
    for (const o of orphans) {
      // Checked again just before removal: a row may have been written since the listing.
      if (await knex('stored_files').where({ storage_key: o.key }).first('id')) continue;
      await options.deleteObject(o.key);
      removed++;
    }
  }
  return {
    objects: objects.length,
    rows: rows.length,
    orphans: orphans.map((o) => ({ key: o.key, bytes: o.bytes, lastModified: o.lastModified.toISOString() })),
    recentUnreferenced: unreferenced.length - orphans.length,
    removed,
    missing: rows.filter((r) => !present.has(r.storage_key)).map((r) => ({ id: r.id, key: r.storage_key, purpose: r.purpose }))
  };
}
