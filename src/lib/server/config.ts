/**
 * The only place that reads the environment. Typed, validated once, fails fast.
 * Variables are documented in README.md ("Configuration").
 */
import { z } from 'zod';
import { connectionSettings } from './db/connection';

const SOLVE_WORKERS_RULE = 'PF_SOLVE_WORKERS must be a whole number from 0 to 16';

const envSchema = z.object({
  AUTH_SECRET: z.string().min(32, 'AUTH_SECRET must be at least 32 characters').optional(),
  ORIGIN: z.string().url().optional(),
  TRUST_PROXY_HOST: z.enum(['0', '1'], 'TRUST_PROXY_HOST must be 0 or 1').default('0'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  SMTP_SECURE: z.enum(['true', 'false']).default('false'),
  MAIL_FROM: z.string().default('Phosforge <noreply@phosforge.invalid>'),
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().default('phosforge-files'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: z.enum(['true', 'false']).default('true'),
  /** 1 on a Galera cluster: each session waits for the node to apply every earlier commit before it reads (wsrep_sync_wait). */
  DB_CAUSAL_READS: z.enum(['0', '1'], 'DB_CAUSAL_READS must be 0 or 1').default('0'),
  DB_POOL_MAX: z.coerce.number().int().min(2, 'DB_POOL_MAX must be at least 2').max(500, 'DB_POOL_MAX must be at most 500').default(20),
  PF_SOLVE_WORKERS: z.preprocess(
    (v) => (v === '' ? undefined : v),
    z.coerce.number(SOLVE_WORKERS_RULE).int(SOLVE_WORKERS_RULE).min(0, SOLVE_WORKERS_RULE).max(16, SOLVE_WORKERS_RULE).optional()
  ),
  PF_SOLVE_WORKER: z.string().min(1).default('build/solve-worker.js'),
  PF_READ_WORKER: z.string().min(1).default('build/measure-worker.js'),
  PF_READ_IN_WORKER: z.enum(['0', '1'], 'PF_READ_IN_WORKER must be 0 or 1').optional(),
  PRICE_CURRENCY: z
    .string()
    .regex(/^[A-Z]{3}$/, 'PRICE_CURRENCY must be an ISO 4217 code such as EUR')
    .default('EUR'),
  NODE_ENV: z.string().default('development')
});

/** The configuration from an environment (process.env in the app); throws a readable error. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env) {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Phosforge configuration error: ${lines}`);
  }
  const env = parsed.data;
  return {
    authSecret: env.AUTH_SECRET,
    origin: env.ORIGIN,
    /** Whether X-Forwarded-Host/-Proto come from a trusted reverse proxy; otherwise ORIGIN decides. */
    trustProxyHost: env.TRUST_PROXY_HOST === '1',
    production: env.NODE_ENV === 'production',
    /** The currency of every price in the library (ISO 4217), shown beside costs. */
    priceCurrency: env.PRICE_CURRENCY,
    db: connectionSettings(source),
    dbPoolMax: env.DB_POOL_MAX,
    /** Galera causal reads: a request never reads older data than a write it follows on another node. */
    dbCausalReads: env.DB_CAUSAL_READS === '1',
    /** Solver worker threads per instance; null = one per core (at most 4). */
    solveWorkers: env.PF_SOLVE_WORKERS ?? null,
    /** The bundled solver worker (built by `npm run build`). */
    solveWorkerFile: env.PF_SOLVE_WORKER,
    /** The bundled measurement reader (built by `npm run build`). */
    readWorkerFile: env.PF_READ_WORKER,
    /** Read files in the worker outside the built app too (the database bench); 0 = never. */
    readInWorker: env.PF_READ_IN_WORKER === undefined ? null : env.PF_READ_IN_WORKER === '1',
    mail: {
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE === 'true',
      auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASS ?? '' } : undefined,
      from: env.MAIL_FROM
    },
    storage: {
      endpoint: env.S3_ENDPOINT,
      region: env.S3_REGION,
      bucket: env.S3_BUCKET,
      accessKeyId: env.S3_ACCESS_KEY_ID,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY,
      forcePathStyle: env.S3_FORCE_PATH_STYLE === 'true'
    }
  };
}

export type AppConfig = ReturnType<typeof loadConfig>;
let cached: AppConfig | undefined;

export function config(): AppConfig {
  cached ??= loadConfig();
  return cached;
}
