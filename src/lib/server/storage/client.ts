/** The one S3 client of the app (object storage for uploaded and generated files). */
import { CreateBucketCommand, HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import { config } from '../config';

let client: S3Client | undefined;
let bucketReady: Promise<void> | undefined;

export function s3(): S3Client {
  const s = config().storage;
  client ??= new S3Client({
    region: s.region,
    endpoint: s.endpoint,
    forcePathStyle: s.forcePathStyle,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey }
  });
  return client;
}

export function bucket(): string {
  return config().storage.bucket;
}

/** Makes sure the bucket exists (once per process); creates it when the store answers 404. */
export function ensureBucket(): Promise<void> {
  bucketReady ??= (async () => {
    try {
      await s3().send(new HeadBucketCommand({ Bucket: bucket() }));
    } catch (err) {
      const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
      if (status !== 404) throw err;
      await s3().send(new CreateBucketCommand({ Bucket: bucket() }));
    }
  })().catch((err) => {
    bucketReady = undefined;
    throw err;
  });
  return bucketReady;
}
