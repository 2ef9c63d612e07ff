/** Every object of a bucket (optionally under a prefix), page by page (ListObjectsV2, 1,000 keys a page). */
import { ListObjectsV2Command, type S3Client } from '@aws-sdk/client-s3';

export interface ListedObject {
  key: string;
  bytes: number;
  lastModified: Date;
}

export async function listObjects(s3: S3Client, bucket: string, prefix?: string): Promise<ListedObject[]> {
  const out: ListedObject[] = [];
  let token: string | undefined;
  do {
    const page = await s3.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: prefix, ContinuationToken: token }));
    for (const o of page.Contents ?? []) out.push({ key: o.Key!, bytes: o.Size ?? 0, lastModified: o.LastModified ?? new Date(0) });
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return out;
}
