/**
 * Hostile input on the revision commands: 1,000 generated malformed bodies each for starting a
 * revision, editing a draft, submitting, quality's signed review, approval and return, and
 * withdrawing. No answer may be an exception (a 500), and a refused body must leave the formulation
 * tables (and, where no password is checked, the audit trail) exactly as they were.
 */
import { afterAll, beforeAll, describe, it } from 'vitest';
import { POST as revisionsPost } from '../../../src/routes/api/v1/formulations/[id]/revisions/+server';
import { PUT as revisionPut } from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/+server';
import { POST as submitPost } from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/submit/+server';
import { POST as reviewPost } from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/review/+server';
import { POST as approvePost } from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/approve/+server';
import { POST as returnPost } from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/return/+server';
import { POST as withdrawPost } from '../../../src/routes/api/v1/formulations/[id]/revisions/[revisionId]/withdraw/+server';
import { closeDb } from '../../../src/lib/server/db/index';
import type { User } from '../../../src/lib/server/accounts/users';
import { fuzzRoute, refreshEvery, type FuzzCase } from './fuzz-support';
import {
  SIGNER_PASSWORD,
  author,
  probeDraft,
  probeFormulation,
  probeSigner,
  probeSubmitted,
  retireSigner,
  versionReader,
  type ProbeFormulation
} from './fuzz-probes';

const TABLES = ['formulations', 'formulation_revisions', 'revision_signatures', 'audit_events'];
/**
 * A refused e-signature (wrong password) is itself written to the audit trail (21 CFR 11.300(d)
 * style: failed attempts are recorded), so the signing routes watch every table but audit_events.
 */
const SIGNING_TABLES = TABLES.filter((t) => t !== 'audit_events');
/**
 * Targets used up by a successful command are replaced this often. Submitting, approving and
 * returning send e-mail, which takes about 150 ms a message with the local SMTP catcher, so their
 * targets are made up front, concurrently, and replaced every 200 runs; a draft to withdraw is
 * cheap and replaced every 50.
 */
const MAILING_FRESH_EVERY = 200;
const FRESH_EVERY = 50;
const MAILING_TARGETS = 1000 / MAILING_FRESH_EVERY;

let rhea: User;
let signer: User;
let f: ProbeFormulation;
const target = { draft: 0, submit: 0, review: 0, approve: 0, return: 0, withdraw: 0 };
const pool: { submit: number[]; approve: number[]; return: number[] } = { submit: [], approve: [], return: [] };
const many = (n: number, make: () => Promise<number>) => Promise.all(Array.from({ length: n }, make));
function take(ids: number[]): number {
  const id = ids.shift();
  if (id === undefined) throw new Error('no fuzz target left in the pool');
  return id;
}
const readVersion = versionReader('formulation_revisions');
const version = (revisionId: number, last: number | undefined) => readVersion({ id: revisionId }, last);
const revisionParams = (revisionId: number) => ({ id: String(f.formulationId), revisionId: String(revisionId) });

beforeAll(async () => {
  rhea = await author();
  signer = await probeSigner();
  f = await probeFormulation(rhea, 'revisions');
  target.draft = f.firstRevisionId;
  // An approval may not replace a newer approved revision: approve targets go oldest first.
  [target.review, ...pool.approve] = (await many(1 + MAILING_TARGETS, () => probeSubmitted(rhea, f))).sort((a, b) => a - b);
  pool.return = await many(MAILING_TARGETS, () => probeSubmitted(rhea, f));
  pool.submit = await many(MAILING_TARGETS, () => probeDraft(rhea, f));
}, 60_000);
afterAll(async () => {
  // Probe formulations stay: revisions are permanent records.
  await retireSigner();
  await closeDb();
});

type Command = 'submit' | 'review' | 'approve' | 'return' | 'withdraw';

/**
 * A state command on its own target revision; the valid body is `body` with the version read. A
 * command that uses its target up gets a fresh one every `fresh.every` runs (and every fifth body
 * is the valid one plus an unknown key, so the command itself runs often enough).
 */
function onRevision(
  command: Command,
  handler: FuzzCase['handler'],
  user: () => User,
  tables: string[],
  body: Record<string, unknown>,
  fresh?: { every: number; make: () => Promise<number> }
): FuzzCase {
  return {
    name: `POST /api/v1/formulations/[id]/revisions/[revisionId]/${command}`,
    handler,
    user,
    tables,
    params: () => revisionParams(target[command]),
    ...(fresh && {
      prepare: refreshEvery(fresh.every, async () => {
        target[command] = await fresh.make();
      }),
      extraKeyEvery: 5
    }),
    valid: async (_i, last) => ({ ...body, version: await version(target[command], last) })
  };
}

const cases = (): FuzzCase[] => [
  {
    name: 'POST /api/v1/formulations/[id]/revisions',
    handler: revisionsPost,
    user: () => rhea,
    tables: TABLES,
    params: () => ({ id: String(f.formulationId) }),
    valid: () => ({ content: f.content, basedOnRevisionId: f.firstRevisionId })
  },
  {
    name: 'PUT /api/v1/formulations/[id]/revisions/[revisionId]',
    handler: revisionPut,
    method: 'PUT',
    user: () => rhea,
    tables: TABLES,
    params: () => revisionParams(target.draft),
    valid: async (_i, last) => ({ version: await version(target.draft, last), content: f.content })
  },
  onRevision('submit', submitPost, () => rhea, TABLES, {}, { every: MAILING_FRESH_EVERY, make: async () => take(pool.submit) }),
  onRevision('review', reviewPost, () => signer, SIGNING_TABLES, { password: SIGNER_PASSWORD, comment: 'Fuzz probe: reviewed.' }),
  onRevision(
    'approve',
    approvePost,
    () => signer,
    SIGNING_TABLES,
    { password: SIGNER_PASSWORD, comment: 'Fuzz probe: approved.' },
    { every: MAILING_FRESH_EVERY, make: async () => take(pool.approve) }
  ),
  onRevision(
    'return',
    returnPost,
    () => signer,
    SIGNING_TABLES,
    { password: SIGNER_PASSWORD, reason: 'Fuzz probe: returned for rework.' },
    { every: MAILING_FRESH_EVERY, make: async () => take(pool.return) }
  ),
  onRevision(
    'withdraw',
    withdrawPost,
    () => rhea,
    TABLES,
    { reason: 'Fuzz probe: no longer needed.' },
    { every: FRESH_EVERY, make: () => probeDraft(rhea, f) }
  )
];

describe.each(cases().map((c) => [c.name, c] as const))('fuzzing %s', (_name, c) => {
  it('1,000 mutated bodies: no exception, and a refused body saves nothing', () => fuzzRoute(c), 300_000);
});
