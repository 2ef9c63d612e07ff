/**
 * Shared pieces of the API fuzz tests: hostile leaves, a one-leaf mutation of a valid body, a fake
 * SvelteKit event, a fingerprint of tables (CHECKSUM TABLE, so a partial UPDATE shows as well as an
 * insert) and the loop that sends 1,000 mutated bodies to one handler and checks every answer.
 */
import fc from 'fast-check';
import { expect } from 'vitest';
import { db } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/accounts/users';
import type { User } from '../../../src/lib/server/accounts/users';

export const FUZZ_RUNS = 1000;
export const FUZZ_SEED = 20261202;

/**
 * Values put where a valid one stood: wrong types, non-finite stand-ins, numbers at and just past
 * the limits the schemas and columns set, injection-looking text, full Unicode (NUL, lone
 * surrogates, right-to-left override, 4-byte characters) and text longer than any text field.
 */
export const hostileLeaf = fc.oneof(
  fc.constantFrom(null, true, '', 'NaN', '<script>alert(1)</script>', "x'); DROP TABLE materials; --", -1, 0, 1e308, 2 ** 53, '１２'),
  fc.double(),
  fc.string({ maxLength: 300 }),
  fc.string({ unit: 'binary', maxLength: 300 }),
  fc.string({ unit: 'binary', minLength: 2001, maxLength: 6000 }),
  fc.constantFrom(
    '\u0000',
    '\ud800',
    'a\udfffb',
    '😀'.repeat(40),
    'é'.repeat(81),
    ' '.repeat(5),
    '\u202e',
    'Infinity',
    '-0',
    '1e400',
    '0x10',
    ' 12 ',
    '12,5',
    '9'.repeat(30)
  ),
  fc.constantFrom(
    1e-7,
    5e-324,
    -0,
    0.0001,
    0.1,
    1,
    7,
    7.5,
    10,
    100,
    1000,
    1001,
    10_000,
    100_000,
    100_001,
    1e7,
    1e7 + 1,
    2 ** 31 - 1,
    2 ** 31,
    Number.MAX_SAFE_INTEGER,
    -(2 ** 31)
  ),
  fc.array(fc.oneof(fc.double(), fc.string()), { maxLength: 6 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.integer(), { maxKeys: 3 })
);

/** Replaces, deletes or adds one value at a path of a valid body chosen by `choices`. */
export function mutate(body: unknown, choices: number[], leaf: unknown): unknown {
  const clone = structuredClone(body) as Record<string, unknown>;
  let node: Record<string, unknown> = clone;
  for (const c of choices) {
    const keys = Object.keys(node);
    if (keys.length === 0) break;
    const k = keys[c % keys.length];
    const next = node[k];
    if (next && typeof next === 'object' && c % 3 !== 0) {
      node = next as Record<string, unknown>;
      continue;
    }
    if (c % 5 === 0 && !Array.isArray(node)) delete node[k];
    else node[k] = leaf;
    return clone;
  }
  node['extra'] = leaf;
  return clone;
}

export interface EventOptions {
  method?: string;
  params?: Record<string, string>;
  url?: string;
}

/** The event a SvelteKit handler gets: a JSON request from a signed-in user (API token style). */
export function apiEvent(user: User, body: unknown, opts: EventOptions = {}) {
  const url = new URL(opts.url ?? 'http://local/api');
  return {
    request: new Request(url, {
      method: opts.method ?? 'POST',
      body: JSON.stringify(body),
      headers: { 'content-type': 'application/json' }
    }),
    locals: { user, viaToken: true, denied: null },
    params: opts.params ?? {},
    url
  };
}

/**
 * One line that changes when any row of these tables is inserted, updated or deleted: CHECKSUM TABLE
 * in one query. audit_events is append-only (its triggers refuse UPDATE and DELETE), so its highest
 * id says as much as a checksum of the whole, ever-growing trail, at a fraction of the cost.
 */
export async function tableState(tables: string[]): Promise<string> {
  const checked = tables.filter((t) => t !== 'audit_events');
  const [[rows], audit] = await Promise.all([
    db().raw(`CHECKSUM TABLE ${checked.map(() => '??').join(', ')}`, checked),
    tables.includes('audit_events') ? db()('audit_events').max<{ n: number | null }>('id as n').first() : undefined
  ]);
  const sums = (rows as { Table: string; Checksum: number | null }[]).map((r) => `${r.Table.split('.').pop()}=${r.Checksum}`);
  return [...sums, ...(audit ? [`audit_events<=${audit.n}`] : [])].join(' ');
}

export async function userByEmail(email: string): Promise<User> {
  const row = await db()('users').where({ email }).first('id');
  const user = row ? await users.get(row.id) : null;
  if (!user) throw new Error(`user ${email} missing: run the tests in a seeded sandbox`);
  return user;
}

export interface FuzzCase {
  name: string;
  handler: (event: never) => Promise<Response> | Response;
  user: () => User;
  /** Tables a refused body must leave exactly as they were. */
  tables: string[];
  method?: string;
  /** Route parameters of run `i`. */
  params?: (i: number) => Record<string, string>;
  /** A body the route accepts for run `i` (it may read the current version of its target). */
  valid: (i: number, lastStatus: number | undefined) => unknown;
  /**
   * Every n-th body is the valid body with the hostile leaf added under an unknown top-level key
   * (one of the mutations `mutate` makes too), so short bodies also reach the command behind the
   * schema often enough: stale versions, repeated commands, state changes.
   */
  extraKeyEvery?: number;
  /**
   * Called before run `i` with the status of the previous run; returns true when it changed the
   * database (a fresh target), so the fingerprint of the watched tables is taken again.
   */
  prepare?: (i: number, lastStatus: number | undefined) => Promise<boolean>;
}

/** A `prepare` that makes a fresh target before run 0 and every `n` runs after it. */
export function refreshEvery(n: number, make: () => Promise<void>): NonNullable<FuzzCase['prepare']> {
  return async (i) => {
    if (i % n !== 0) return false;
    await make();
    return true;
  };
}

export type Tally = Map<number, number>;

export const tallyText = (t: Tally) =>
  [...t]
    .sort(([a], [b]) => a - b)
    .map(([s, n]) => `${s}×${n}`)
    .join(' ');

/**
 * 1,000 bodies, each a valid body with one leaf replaced, deleted or added: no answer is a 500,
 * a refusal (>= 400) is a JSON { error } and leaves the watched tables unchanged.
 */
export async function fuzzRoute(c: FuzzCase): Promise<Tally> {
  const tally: Tally = new Map();
  const started = performance.now();
  let i = 0;
  let last: number | undefined;
  let baseline = await tableState(c.tables);
  await fc.assert(
    fc.asyncProperty(fc.array(fc.nat(50), { minLength: 1, maxLength: 6 }), hostileLeaf, async (choices, leaf) => {
      const run = i++;
      if (c.prepare && (await c.prepare(run, last))) baseline = await tableState(c.tables);
      const before = baseline;
      const valid = await c.valid(run, last);
      const body =
        c.extraKeyEvery && run % c.extraKeyEvery === c.extraKeyEvery - 1
          ? { ...(valid as object), unexpected: leaf }
          : mutate(valid, choices, leaf);
      const res = await c.handler(apiEvent(c.user(), body, { method: c.method, params: c.params?.(run) }) as never);
      last = res.status;
      tally.set(res.status, (tally.get(res.status) ?? 0) + 1);
      expect(res.status, `status ${res.status} for ${JSON.stringify(body).slice(0, 400)}: ${await res.clone().text()}`).toBeLessThan(500);
      if (res.status >= 400) {
        expect(typeof (await res.json()).error).toBe('string');
        expect(await tableState(c.tables), `a refused body (${res.status}) changed a table`).toBe(before);
      } else {
        baseline = await tableState(c.tables);
      }
    }),
    { numRuns: FUZZ_RUNS, seed: FUZZ_SEED }
  );
  console.log(`fuzz ${c.name}: ${tallyText(tally)} (${((performance.now() - started) / 1000).toFixed(1)} s)`);
  // The generator must reach the validator's refusals and, past it, the service itself.
  expect(tally.get(400) ?? 0).toBeGreaterThan(100);
  expect(FUZZ_RUNS - (tally.get(400) ?? 0)).toBeGreaterThan(0);
  return tally;
}

/** The highest material id now: the materials above it are the probes a fuzz file made. */
export async function lastMaterialId(): Promise<number> {
  return Number((await db()('materials').max<{ n: number | null }>('id as n').first())?.n ?? 0);
}

/**
 * Removes the materials made after `lastIdBefore` (probes, used by nothing) with their spectra and
 * lots. By id, not by code: a mutated body may have given a probe any code.
 */
export async function removeProbeMaterials(lastIdBefore: number): Promise<void> {
  const ids = (await db()('materials').where('id', '>', lastIdBefore).select('id')).map((r) => r.id);
  if (!ids.length) return;
  await db()('materials').whereIn('id', ids).update({ emission_spectrum_id: null, excitation_spectrum_id: null });
  await db()('material_spectra').whereIn('material_id', ids).delete();
  await db()('material_lots').whereIn('material_id', ids).delete();
  await db()('materials').whereIn('id', ids).delete();
}
