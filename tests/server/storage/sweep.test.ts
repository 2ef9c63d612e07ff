/**
 * The storage sweep against the local object store and the test database: an object without a
 * stored_files row is an orphan once older than the margin and is removed only when asked; a row
 * whose object is gone is reported as missing; objects with rows are never touched.
 */
import { HeadObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { bucket, ensureBucket, s3 } from '../../../src/lib/server/storage/client';
import { deleteFile, deleteStoredObject, putFile } from '../../../src/lib/server/storage/objects';
import { sweepStorage } from '../../../src/lib/server/storage/sweep';

const run = Date.now().toString(36);
const orphanKey = `measurement/2026-12/sweep-orphan-${run}.csv`;
const missingKey = `measurement/2026-12/sweep-missing-${run}.csv`;
let keptId = 0;
let keptKey = '';
let missingId = 0;

const exists = async (Key: string) =>
  s3()
    .send(new HeadObjectCommand({ Bucket: bucket(), Key }))
    .then(
      () => true,
      () => false
    );
const sweep = (olderThanMs: number, remove = false) =>
  sweepStorage(db(), s3(), bucket(), { olderThanMs, remove, deleteObject: deleteStoredObject });

beforeAll(async () => {
  await ensureBucket();
  // An upload whose process died after the put, before its row: an object with no row.
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: orphanKey, Body: '380,0.1\n' }));
  keptId = await putFile({ body: Buffer.from('380,0.2\n'), originalName: 'kept.csv', contentType: 'text/csv', purpose: 'measurement' });
  keptKey = (await db()('stored_files').where({ id: keptId }).first('storage_key'))!.storage_key;
  // A row whose object is gone (a lost file).
  [missingId] = await db()('stored_files').insert({
    storage_key: missingKey,
    original_name: 'lost.csv',
    content_type: 'text/csv',
    bytes: 9,
    sha256: '0'.repeat(64),
    purpose: 'measurement'
  });
});
afterAll(async () => {
  await db()('stored_files').where({ id: missingId }).delete();
  await deleteFile(keptId);
  await deleteStoredObject(orphanKey);
  await closeDb();
});

describe('storage sweep', () => {
  it('reports the orphan and the missing object, and leaves everything in place without --remove', async () => {
    const r = await sweep(0);
    expect(r.orphans.map((o) => o.key)).toContain(orphanKey);
    expect(r.orphans.map((o) => o.key)).not.toContain(keptKey);
    expect(r.missing).toContainEqual({ id: missingId, key: missingKey, purpose: 'measurement' });
    expect(r.removed).toBe(0);
    expect(await exists(orphanKey)).toBe(true);
  });

  it('leaves objects newer than the margin alone (an upload may still be committing)', async () => {
    const r = await sweep(3_600_000, true);
    expect(r.orphans.map((o) => o.key)).not.toContain(orphanKey);
    expect(r.recentUnreferenced).toBeGreaterThanOrEqual(1);
    expect(await exists(orphanKey)).toBe(true);
  });

  it('removes orphans past the margin when asked, never an object that has its row', async () => {
    const r = await sweep(0, true);
    expect(r.removed).toBeGreaterThanOrEqual(1);
    expect(await exists(orphanKey)).toBe(false);
    expect(await exists(keptKey)).toBe(true);
    const again = await sweep(0);
    expect(again.orphans.map((o) => o.key)).not.toContain(orphanKey);
  });
});
