/**
 * The database dies while a request runs: its connection is killed mid-query (what a server
 * shutdown or restart does to every open connection). API answers must be 503 `{ error }` naming
 * the database, logged — also when the error escapes to SvelteKit's handleError (which alone would
 * answer 500 `{ message }`) — and pages get a 503 page that says which service is down.
 */
import { afterAll, describe, expect, it, vi } from 'vitest';
import { json } from '@sveltejs/kit';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { apiHandler, DB_UNAVAILABLE } from '../../../src/lib/server/http/api-handler';
import { answerOutages, noteOutage, STORAGE_UNAVAILABLE, StorageUnavailableError } from '../../../src/lib/server/http/outage';

afterAll(closeDb);

/** Runs a slow query and kills its connection from another one halfway; resolves with what the query threw. */
async function queryKilledMidway(): Promise<unknown> {
  const marker = `outage_probe_${Math.random().toString(36).slice(2)}`;
  // A knex query runs when awaited: start it now, keep what it throws.
  const running = db()
    .raw(`SELECT SLEEP(5) AS ${marker}`)
    .then(
      () => null,
      (err: unknown) => err
    );
  let victim: number | undefined;
  for (let i = 0; i < 50 && victim === undefined; i++) {
    await new Promise((r) => setTimeout(r, 20));
    const [rows] = await db().raw('SELECT id FROM information_schema.processlist WHERE info LIKE ? AND info NOT LIKE ?', [
      `%${marker}%`,
      '%processlist%'
    ]);
    victim = (rows as { id: number }[])[0]?.id;
  }
  expect(victim).toBeDefined();
  await db().raw(`KILL CONNECTION ${Number(victim)}`);
  return running;
}

function fakeEvent(path: string) {
  return { locals: {} as App.Locals, request: new Request(`http://local${path}`), url: new URL(`http://local${path}`) };
}

describe('outages in the middle of a request', () => {
  it('answers an API request whose database connection is killed mid-query with 503 { error } and logs it', async () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const res = await apiHandler(async () => {
      await db().raw('SELECT 1');
      const err = await queryKilledMidway();
      throw err;
    });
    expect(res.status).toBe(503);
    expect(res.headers.get('retry-after')).toBe('5');
    expect(await res.json()).toEqual({ error: DB_UNAVAILABLE });
    expect(log.mock.calls.map((c) => c.join(' ')).join('\n')).toMatch(/\[phosforge\] database unavailable/);
    log.mockRestore();
    expect((await db().raw('SELECT 1 AS ok'))[0][0].ok).toBe(1); // the pool recovers by itself
  }, 20_000);

  it('turns the 500 { message } of an error escaping to handleError into 503 { error } (API) or a 503 page', async () => {
    const killed = await queryKilledMidway();
    vi.spyOn(console, 'error').mockImplementation(() => {});
    for (const [path, type] of [
      ['/api/v1/batches', 'application/json'],
      ['/batches/new', 'text/html']
    ] as const) {
      const event = fakeEvent(path);
      // What SvelteKit does with an error a handler throws: handleError's object, status 500.
      const resolve = async () => {
        const shown = noteOutage(killed, event)!;
        expect(shown).toEqual({ message: DB_UNAVAILABLE, outage: 'database' });
        return type === 'text/html'
          ? new Response(`<h1>${shown.message}</h1>`, { status: 500, headers: { 'content-type': type } })
          : json(shown, { status: 500 });
      };
      const res = await answerOutages({ event, resolve } as never);
      expect(res.status).toBe(503);
      if (type === 'application/json') expect(await res.json()).toEqual({ error: DB_UNAVAILABLE });
      else expect(await res.text()).toContain(DB_UNAVAILABLE);
    }
    vi.restoreAllMocks();
  }, 20_000);

  it('names the file storage, not the database, and leaves ordinary 500s alone', async () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:4570'), { code: 'ECONNREFUSED' });
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const res = await apiHandler(() => {
      throw new StorageUnavailableError(refused);
    });
    expect([res.status, await res.json()]).toEqual([503, { error: STORAGE_UNAVAILABLE }]);
    const event = fakeEvent('/api/v1/x');
    expect(noteOutage(new TypeError('x is undefined'), event)).toBeNull();
    const plain = await answerOutages({ event, resolve: async () => json({ message: 'boom' }, { status: 500 }) } as never);
    expect(plain.status).toBe(500);
    vi.restoreAllMocks();
  });
});
