/**
 * Fault injection for integration tests (real MariaDB, local S3 fake): a temporary trigger makes
 * one chosen write fail in the middle of a service's transaction (SIGNAL SQLSTATE '45000', the
 * standard way for a trigger to refuse a row), table snapshots compare "before" and "after"
 * exactly, and the app's S3 client is watched so every object it put can be looked up afterwards.
 */
import { HeadObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { expect, vi } from 'vitest';
import { db } from '../../src/lib/server/db/index';
import { bucket, s3 } from '../../src/lib/server/storage/client';
import { listObjects } from '../../src/lib/server/storage/list';

export const INJECTED = 'injected fault (test)';
const TRIGGER_PREFIX = 'test_fault_';

export interface Fault {
  /** Which step of the service fails, for the test name. */
  label: string;
  table: string;
  event: 'INSERT' | 'UPDATE';
  /** SQL condition over NEW/OLD; the write fails only when it holds. */
  when?: string;
}

/** Runs `fn` while `fault.event` on `fault.table` fails; the trigger is dropped again whatever happens. */
export async function withFailingWrite<T>(fault: Fault, fn: () => Promise<T>): Promise<T> {
  const name = `${TRIGGER_PREFIX}${fault.table}_${fault.event.toLowerCase()}`;
  await db().raw(`DROP TRIGGER IF EXISTS \`${name}\``);
  await db().raw(`CREATE TRIGGER \`${name}\` BEFORE ${fault.event} ON \`${fault.table}\` FOR EACH ROW
    BEGIN
      IF ${fault.when ?? 'TRUE'} THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${INJECTED}'; END IF;
    END`);
  try {
    return await fn();
  } finally {
    await db().raw(`DROP TRIGGER IF EXISTS \`${name}\``);
  }
}

/** Drops fault triggers an interrupted earlier run may have left in this database. */
export async function dropLeftoverFaults(): Promise<void> {
  const names: string[] = await db()('information_schema.TRIGGERS')
    .where('TRIGGER_SCHEMA', db().raw('DATABASE()'))
    .andWhere('TRIGGER_NAME', 'like', `${TRIGGER_PREFIX}%`)
    .pluck('TRIGGER_NAME');
  for (const n of names) await db().raw(`DROP TRIGGER IF EXISTS \`${n}\``);
}

/**
 * Row count, highest id and CHECKSUM TABLE (a checksum over every row's values) per table: two
 * equal snapshots mean no row was added, removed or changed.
 */
export async function snapshot(tables: readonly string[]): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const t of tables) {
    const [[sum]] = (await db().raw(`CHECKSUM TABLE \`${t}\``)) as [{ Checksum: number | string | null }[]];
    const r = (await db()(t).count({ n: '*' }).max({ top: 'id' }).first()) as { n: number; top: number | null };
    out[t] = `${r.n} rows, max id ${r.top}, checksum ${sum.Checksum}`;
  }
  return out;
}

/** The error a write that must fail throws (a write that succeeds fails the test). */
export async function failureOf(p: Promise<unknown>): Promise<Error> {
  try {
    await p;
  } catch (err) {
    return err as Error;
  }
  throw new Error('expected the write to fail, but it succeeded');
}

/** Records the key of every object the app's storage client puts, until `stop()`. */
export function watchPuts(): { keys: string[]; stop: () => void } {
  const client = s3();
  const keys: string[] = [];
  const original = client.send.bind(client);
  const spy = vi.spyOn(client, 'send').mockImplementation(((command: unknown, ...rest: unknown[]) => {
    if (command instanceof PutObjectCommand && command.input.Key) keys.push(command.input.Key);
    return (original as (...a: unknown[]) => unknown)(command, ...rest);
  }) as typeof client.send);
  return { keys, stop: () => spy.mockRestore() };
}

/** Runs `fn` and returns the error it throws together with the keys of every object it put into storage. */
export async function failureWithPuts(fn: () => Promise<unknown>): Promise<{ error: Error; keys: string[] }> {
  const puts = watchPuts();
  try {
    return { error: await failureOf(fn()), keys: puts.keys };
  } finally {
    puts.stop();
  }
}

export async function objectExists(key: string): Promise<boolean> {
  try {
    await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return true;
  } catch (err) {
    if ((err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false;
    throw err;
  }
}

/** Keys under `prefix` whose name contains `text` (the bucket is shared by every sandbox, so tests look for their own names). */
export async function keysContaining(prefix: string, text: string): Promise<string[]> {
  return (await listObjects(s3(), bucket(), prefix)).map((o) => o.key).filter((k) => k.includes(text));
}

/** Waits until none of `keys` is in object storage (clean-up runs once the rollback is done); returns the wait in ms. */
export async function expectObjectsGone(keys: readonly string[], timeoutMs = 15_000): Promise<number> {
  const t0 = Date.now();
  await vi.waitFor(
    async () => {
      for (const k of keys) expect(await objectExists(k), `object ${k} is still stored`).toBe(false);
    },
    { timeout: timeoutMs, interval: 50 }
  );
  return Date.now() - t0;
}
