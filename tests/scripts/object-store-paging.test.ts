/**
 * The local object store pages long listings as S3 does (ListObjectsV2 with continuation tokens):
 * `npm run backup` lists the bucket page by page, so a bucket of more than 1,000 objects must list
 * whole. Uses a bucket of its own with a small page size.
 */
import { CreateBucketCommand, DeleteBucketCommand, DeleteObjectCommand, ListObjectsV2Command, PutObjectCommand } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { s3FromEnv } from '../../scripts/backup/s3';

const s3 = s3FromEnv();
const Bucket = `paging-${Date.now().toString(36)}`;
const keys = Array.from({ length: 25 }, (_, i) => `measurement/2026-12/${String(i).padStart(3, '0')}-part.csv`);

beforeAll(async () => {
  await s3.send(new CreateBucketCommand({ Bucket }));
  for (const Key of keys) await s3.send(new PutObjectCommand({ Bucket, Key, Body: 'x' }));
});
afterAll(async () => {
  for (const Key of keys) await s3.send(new DeleteObjectCommand({ Bucket, Key }));
  await s3.send(new DeleteBucketCommand({ Bucket }));
});

describe('object store listing', () => {
  it('lists 25 objects in pages of 10 with continuation tokens', async () => {
    const seen: string[] = [];
    let token: string | undefined;
    let pages = 0;
    do {
      const page = await s3.send(new ListObjectsV2Command({ Bucket, MaxKeys: 10, ContinuationToken: token }));
      seen.push(...(page.Contents ?? []).map((o) => o.Key!));
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
      pages++;
    } while (token);
    expect(pages).toBe(3);
    expect(seen).toEqual(keys);
  });
});
