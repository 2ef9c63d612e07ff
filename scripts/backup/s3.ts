/** S3 client for the backup tools, configured from the same variables as the app (README "Configuration"). */
import { S3Client } from '@aws-sdk/client-s3';

export function s3FromEnv(env: NodeJS.ProcessEnv = process.env): S3Client {
  return new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION ?? 'us-east-1',
    forcePathStyle: (env.S3_FORCE_PATH_STYLE ?? 'true') === 'true',
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID ?? 'S3RVER', secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? 'S3RVER' }
  });
}

export function bucketFromEnv(env: NodeJS.ProcessEnv = process.env): string {
  return env.S3_BUCKET ?? 'phosforge-files';
}
