/**
 * Load run against a served app (started by scripts/load.sh): each scenario drives one API route
 * with autocannon on loopback for a bounded time and reports requests/s, latency p50/p95/p99 and
 * errors (any status other than the expected one, and socket errors/timeouts).
 * Env: LOAD_URL (app origin), LOAD_SECONDS (per scenario, default 10), LOAD_CONNECTIONS (default 50),
 * LOAD_ONLY (comma-separated scenario names, e.g. "evaluate,mix"; default all).
 */
import autocannon from 'autocannon';
import { create as createToken } from '../../src/lib/server/auth/tokens';
import { closeDb, db } from '../../src/lib/server/db/index';
import { parseRecipe } from '../../src/lib/recipe';
import { scenarios, type Scenario } from './scenarios';

const base = process.env.LOAD_URL ?? 'http://127.0.0.1:4174';
const seconds = Number(process.env.LOAD_SECONDS ?? 10);
const connections = Number(process.env.LOAD_CONNECTIONS ?? 50);
const only = (process.env.LOAD_ONLY ?? '')
  .split(',')
  .map((x) => x.trim())
  .filter(Boolean);

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i];
}

async function runOne(s: Scenario, token: string) {
  const latencies: number[] = [];
  let unexpected = 0;
  const statuses = new Map<number, number>();
  const instance = autocannon({
    url: base + s.path,
    method: s.method,
    connections,
    duration: seconds,
    timeout: 10,
    headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json', origin: base },
    requests: s.body
      ? [{ method: s.method, path: s.path, setupRequest: (req) => ({ ...req, body: JSON.stringify(s.body!()) }) }]
      : undefined
  });
  instance.on('response', (_client, status, _bytes, ms) => {
    latencies.push(ms);
    if (status !== s.expect) unexpected++;
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
  });
  const result = await instance;
  latencies.sort((a, b) => a - b);
  return {
    route: `${s.method} ${s.path}`,
    name: s.name,
    requests: result.requests.total,
    rps: Math.round((result.requests.total / result.duration) * 10) / 10,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    errors: unexpected + result.errors + result.timeouts,
    statuses: Object.fromEntries(statuses),
    goalMs: s.p95GoalMs ?? null
  };
}

const formulator = await db()('users').where({ email: 'rhea.okafor@kestrelhollow.example' }).first('id');
if (!formulator) throw new Error('load: the demo formulator is missing (seed the database first)');
const technician = await db()('users').where({ email: 'tomas.brand@kestrelhollow.example' }).first('id');
if (!technician) throw new Error('load: the demo technician is missing (seed the database first)');
const tokens = {
  formulator: (await createToken(formulator.id, 'load run', 1)).token,
  technician: (await createToken(technician.id, 'load run', 1)).token
};
const approved = await db()('formulation_revisions').where({ state: 'approved' }).first('content_json');
if (!approved) throw new Error('load: no approved demo revision to copy a draft from (seed the database first)');
const draftContent = parseRecipe(approved.content_json);
const batchRevision = await db()('formulation_revisions as r')
  .join('formulations as f', 'f.id', 'r.formulation_id')
  .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
  .first('r.id');
if (!batchRevision) throw new Error('load: the approved demo revision of KH-W30-90 is missing (seed the database first)');
await closeDb();

console.log(`load: ${connections} connections, ${seconds} s per route, ${base}`);
const rows = [];
const all = scenarios({ draftContent, batchRevisionId: batchRevision.id });
for (const s of all.filter((x) => only.length === 0 || only.includes(x.name))) {
  const r = await runOne(s, tokens[s.as ?? 'formulator']);
  rows.push(r);
  const goal = r.goalMs ? (r.p95 <= r.goalMs ? `  (p95 goal ${r.goalMs} ms: ok)` : `  (p95 goal ${r.goalMs} ms: MISSED)`) : '';
  console.log(
    `${r.route.padEnd(34)} ${String(r.rps).padStart(8)} req/s  p50 ` +
      `${r.p50.toFixed(1).padStart(7)} ms  p95 ${r.p95.toFixed(1).padStart(7)} ms  p99 ` +
      `${r.p99.toFixed(1).padStart(7)} ms  errors ` +
      `${r.errors}${goal}${r.errors ? `  statuses ${JSON.stringify(r.statuses)}` : ''}`
  );
}
console.log(JSON.stringify({ load: { connections, seconds, routes: rows } }));
const failed = rows.some((r) => r.errors > 0);
process.exit(failed ? 1 : 0);
