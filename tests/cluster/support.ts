/**
 * What the cluster suites share: the Galera nodes of `npm run test:cluster` (scripts/cluster/galera.sh,
 * profile cluster-test), app instances pinned to one node each, API tokens, per-node SQL and table
 * checksums. The runner exports the profile's variables before Vitest starts.
 */
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import knexFactory, { type Knex } from 'knex';
import { startApp, type AppInstance } from '../e2e/support/instances';
import { create as createToken } from '../../src/lib/server/auth/tokens';
import { db } from '../../src/lib/server/db/index';

const run = promisify(execFile);
export const NODE_COUNT = 3;
const BASE_PORT = Number(process.env.PF_CLUSTER_PORT ?? 33511);
export const nodePort = (n: number) => BASE_PORT + n - 1;
const APP_PORT = Number(process.env.PF_APP_A_PORT ?? 4191);

export async function galera(...args: string[]): Promise<string> {
  const { stdout } = await run('bash', ['scripts/cluster/galera.sh', ...args], { env: process.env, maxBuffer: 16 << 20 });
  return stdout;
}

/** A Knex handle on one node, as the app connects (its own user over TCP). */
export function nodeDb(n: number): Knex {
  return knexFactory({
    client: 'mysql2',
    connection: {
      host: '127.0.0.1',
      port: nodePort(n),
      user: process.env.DB_USER ?? 'phosforge',
      password: process.env.DB_PASSWORD ?? 'phosforge-local',
      database: process.env.DB_NAME ?? 'phosforge_cluster'
    },
    // Causal reads: see every write the cluster committed before the query, whichever node took it.
    pool: {
      min: 0,
      max: 2,
      afterCreate: (conn: { query(q: string, cb: (e: Error | null) => void): void }, done: (e: Error | null, c: unknown) => void) =>
        conn.query('SET SESSION wsrep_sync_wait = 1', (e) => done(e, conn))
    }
  });
}

/** App instance number `i` (0, 1, …) on node `n`. */
export function appOnNode(i: number, n: number): Promise<AppInstance> {
  return startApp(APP_PORT + 10 + i, { DB_PORT: String(nodePort(n)) });
}

/** A one-day API token of a demo user (made in the database, as the profile page would). */
export async function tokenOf(email: string): Promise<string> {
  const user = await db()('users').where({ email }).first('id');
  if (!user) throw new Error(`no user ${email}: seed the cluster first`);
  return (await createToken(user.id, 'cluster suite', 1)).token;
}

export function api(base: string, token: string) {
  return async (method: string, path: string, body?: unknown): Promise<{ status: number; json: unknown }> => {
    try {
      const r = await fetch(`${base}${path}`, {
        method,
        headers: { authorization: `Bearer ${token}`, origin: base, 'content-type': 'application/json' },
        body: body === undefined ? undefined : JSON.stringify(body),
        signal: AbortSignal.timeout(15_000)
      });
      return { status: r.status, json: await r.json().catch(() => null) };
    } catch {
      return { status: 0, json: null };
    }
  };
}

/** CHECKSUM TABLE of every base table of the app database on node `n`, by table name. */
export async function checksums(n: number): Promise<Record<string, string>> {
  const k = nodeDb(n);
  try {
    const [tables] = await k.raw(
      "SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE' ORDER BY 1"
    );
    const names = (tables as { t: string }[]).map((r) => r.t);
    const [rows] = await k.raw(`CHECKSUM TABLE ${names.map((t) => `\`${t}\``).join(', ')}`);
    return Object.fromEntries(
      (rows as { Table: string; Checksum: string | number }[]).map((r) => [r.Table.split('.').pop()!, String(r.Checksum)])
    );
  } finally {
    await k.destroy();
  }
}

/** A revision content known to be valid: the first approved demo revision's (seeds/03_formulations.ts). */
export async function validContent(): Promise<Record<string, unknown>> {
  const row = await db()('formulation_revisions').where({ state: 'approved' }).orderBy('id').first('content_json');
  return JSON.parse(row!.content_json);
}

export const unique = (prefix: string) =>
  `${prefix}-${Date.now().toString(36).toUpperCase()}${Math.floor(Math.random() * 46656)
    .toString(36)
    .toUpperCase()}`;

/** The drafts with these codes on every node (causal reads), and every node's table checksums, which must agree. */
export async function everyNode(codes: string[]): Promise<{ codesByNode: string[][]; checksumsByNode: Record<string, string>[] }> {
  const codesByNode: string[][] = [];
  for (let n = 1; n <= NODE_COUNT; n++) {
    const k = nodeDb(n);
    try {
      codesByNode.push((await k('formulations').whereIn('code', codes).select('code')).map((r) => r.code as string).sort());
    } finally {
      await k.destroy();
    }
  }
  const checksumsByNode = await Promise.all([1, 2, 3].map((n) => checksums(n)));
  return { codesByNode, checksumsByNode };
}
