/** The one S3 client of the app (object storage for uploaded and generated files). */
import { CreateBucketCommand, HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import { config } from '../config';
import { logOutage, StorageUnavailableError } from '../http/outage';

const NETWORK_CODES = ['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'ENOTFOUND', 'EHOSTUNREACH', 'ENETUNREACH', 'EPIPE', 'EAI_AGAIN'];

/** The store did not answer (connection refused, reset, timed out) or answered 5xx: it is down, not refusing. */
export function isStorageUnavailable(err: unknown): boolean {
  const e = (err ?? {}) as { code?: string; name?: string; $metadata?: { httpStatusCode?: number } };
  const status = e.$metadata?.httpStatusCode;
  if (status !== undefined) return status >= 500;
  return NETWORK_CODES.includes(e.code ?? '') || e.name === 'TimeoutError';
}

let client: S3Client | undefined;
let bucketReady: Promise<void> | undefined;

export function s3(): S3Client {
  if (client) return client;
  const s = config().storage;
  client = new S3Client({
    region: s.region,
    endpoint: s.endpoint,
    forcePathStyle: s.forcePathStyle,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey }
  });
  // Around the SDK's retries: a store that stays down is named and logged, never taken for the database.
  client.middlewareStack.add(
    (next) => async (args) => {
      try {
        return await next(args);
      } catch (err) {
        if (!isStorageUnavailable(err)) throw err;
        logOutage('file storage', err, String((args.input as { Key?: string })?.Key ?? 'bucket'));
        throw new StorageUnavailableError(err);
      }
    },
    { step: 'initialize', name: 'phosforgeStorageOutage' }
  );
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
