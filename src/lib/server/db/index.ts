/** The one Knex instance of the app (created on first use). */
import knexFactory, { type Knex } from 'knex';
import { config } from '../config';
import type {} from './tables';

let instance: Knex | undefined;

type RawConnection = { query(sql: string, cb: (err: Error | null) => void): void };
const causalReads = (conn: RawConnection, done: (err: Error | null, conn: RawConnection) => void) =>
  conn.query('SET SESSION wsrep_sync_wait = 1', (err) => done(err, conn));

export function db(): Knex {
  instance ??= knexFactory({
    client: 'mysql2',
    connection: { ...config().db, supportBigNumbers: true, decimalNumbers: true },
    pool: {
      min: 0,
      max: config().dbPoolMax,
      acquireTimeoutMillis: 5_000,
      // On a Galera cluster (DB_CAUSAL_READS=1) reads wait until this node has applied what others committed.
      ...(config().dbCausalReads ? { afterCreate: causalReads } : {})
    },
    acquireConnectionTimeout: 5_000
  });
  return instance;
}

export async function closeDb(): Promise<void> {
  if (instance) await instance.destroy();
  instance = undefined;
}

/**
 * Errors that mean "the database cannot be reached right now" (→ 503, not 500). A reset or broken
 * socket counts only when the database driver marks it fatal: a client that drops its own upload
 * also ends in ECONNRESET, and that is not an outage. A server shutting down or killing the
 * connection mid-query (ER_SERVER_SHUTDOWN 1053, ER_CONNECTION_KILLED 1927) is an outage too.
 */
export function isDbUnavailable(err: unknown): boolean {
  const e = (err ?? {}) as { code?: string; fatal?: boolean };
  const code = e.code ?? '';
  const msg = err instanceof Error ? err.message : '';
  if (['ECONNRESET', 'EPIPE', 'ETIMEDOUT'].includes(code)) return e.fatal === true;
  // A Galera node outside the primary component (split, or still joining) refuses queries with 1047
  // "WSREP has not yet prepared node for application use": for the app it is a database that is down.
  if ((e as { errno?: number }).errno === 1047 && /WSREP/i.test(msg)) return true;
  return (
    ['ECONNREFUSED', 'PROTOCOL_CONNECTION_LOST', 'ER_CON_COUNT_ERROR', 'ER_CONNECTION_KILLED', 'ER_SERVER_SHUTDOWN'].includes(code) ||
    /Knex: Timeout acquiring a connection|Connection lost|connect ECONNREFUSED|connection is in closed state/i.test(msg)
  );
}
