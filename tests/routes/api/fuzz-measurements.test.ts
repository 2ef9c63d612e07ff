/**
 * Hostile input on quality's JSON commands: 1,000 generated malformed bodies each for a batch's
 * colour acceptance, a correction draft from the measured mean, the signed release or rejection,
 * and withdrawing a measurement upload. No answer may be an exception (a 500), and a refused body
 * must leave the tables that command writes (and, where no password is checked, the audit trail)
 * exactly as they were.
 */
import { afterAll, beforeAll, describe, it } from 'vitest';
import { PUT as acceptancePut } from '../../../src/routes/api/v1/measurements/[batchId]/acceptance/+server';
import { POST as correctionPost } from '../../../src/routes/api/v1/measurements/[batchId]/correction/+server';
import { POST as dispositionPost } from '../../../src/routes/api/v1/measurements/[batchId]/disposition/+server';
import { POST as withdrawPost } from '../../../src/routes/api/v1/measurements/[batchId]/uploads/[uploadId]/withdraw/+server';
import { closeDb } from '../../../src/lib/server/db/index';
import type { User } from '../../../src/lib/server/accounts/users';
import { fuzzRoute, refreshEvery, type FuzzCase } from './fuzz-support';
import {
  SIGNER_PASSWORD,
  author,
  probeApprovedRevision,
  probeBatch,
  probeSigner,
  probeUpload,
  retireSigner,
  technician,
  versionReader
} from './fuzz-probes';

let signer: User;
let tech: User;
let revisionId: number;
let acceptanceBatchId: number;
/** A completed batch with six measured parts, and one planned batch with none. */
let measuredBatchId: number;
let unmeasuredBatchId: number;
let dispositionBatchId = 0;
/** A completed batch and the version before its last change (what a stale page would send). */
let stale = { batchId: 0, version: 0 };
let uploadId = 0;
let uploads = 0;
const readAcceptanceVersion = versionReader('batch_acceptance');
const readBatchVersion = versionReader('batches');
const batchParams = (batchId: number) => ({ batchId: String(batchId) });
const NO_SUCH_BATCH = 2 ** 31 - 1;

beforeAll(async () => {
  signer = await probeSigner();
  tech = await technician();
  revisionId = await probeApprovedRevision(await author(), signer, 'quality');
  acceptanceBatchId = await probeBatch(tech, revisionId, 'planned');
  unmeasuredBatchId = await probeBatch(tech, revisionId, 'planned');
  measuredBatchId = await probeBatch(tech, revisionId, 'complete');
  await probeUpload(signer, measuredBatchId, 6, `FZQ-${Date.now() % 1e6}`);
  const staleId = await probeBatch(tech, revisionId, 'complete');
  stale = { batchId: staleId, version: (await readBatchVersion({ id: staleId }, undefined)) - 1 };
}, 60_000);
afterAll(async () => {
  // Probe batches, uploads and correction drafts stay: they are permanent records.
  await retireSigner();
  await closeDb();
});

const cases = (): FuzzCase[] => [
  {
    name: 'PUT /api/v1/measurements/[batchId]/acceptance',
    handler: acceptancePut,
    method: 'PUT',
    user: () => signer,
    tables: ['batches', 'batch_acceptance', 'audit_events'],
    params: () => batchParams(acceptanceBatchId),
    valid: async (i, last) => ({
      mode: i % 2 ? 'steps' : 'revision',
      steps: 3 + (i % 3),
      requireTargetBin: i % 3 === 0,
      version: await readAcceptanceVersion({ batch_id: acceptanceBatchId }, last)
    }),
    extraKeyEvery: 5
  },
  {
    name: 'POST /api/v1/measurements/[batchId]/correction',
    handler: correctionPost,
    user: () => signer,
    tables: ['batch_corrections', 'formulations', 'formulation_revisions', 'audit_events'],
    // A correction draft takes about 0.25 s (solver, prediction, e-mail) and even "no measured parts"
    // (409) loads and judges the whole batch: every 40th body goes to the measured batch, the other
    // even ones to a planned batch without measurements, the odd ones to a batch that does not exist.
    params: (i) => batchParams(i % 40 === 0 ? measuredBatchId : i % 2 === 0 ? unmeasuredBatchId : NO_SUCH_BATCH),
    valid: () => ({ stepFraction: 0.8 })
  },
  {
    name: 'POST /api/v1/measurements/[batchId]/disposition',
    handler: dispositionPost,
    user: () => signer,
    // A refused e-signature (wrong password) is itself audited, so audit_events is not watched here.
    tables: ['batches', 'batch_dispositions', 'stored_files'],
    // Odd runs sign a batch that someone changed meanwhile (the body names the version before): the
    // password is checked, then the transaction refuses (409) and must leave nothing behind.
    params: (i) => batchParams(i % 2 ? stale.batchId : dispositionBatchId),
    // A disposition is once per batch and builds the signed batch record PDF: a fresh batch every 250 runs.
    prepare: refreshEvery(250, async () => {
      dispositionBatchId = await probeBatch(tech, revisionId, 'complete');
    }),
    valid: async (i, last) => ({
      decision: 'reject',
      meaning: 'Rejection for rework',
      comment: 'Fuzz probe: rejected for rework.',
      password: SIGNER_PASSWORD,
      version: i % 2 ? stale.version : await readBatchVersion({ id: dispositionBatchId }, last)
    }),
    extraKeyEvery: 5
  },
  {
    name: 'POST /api/v1/measurements/[batchId]/uploads/[uploadId]/withdraw',
    handler: withdrawPost,
    user: () => signer,
    tables: ['measurement_uploads', 'part_measurements', 'audit_events'],
    params: () => ({ batchId: String(measuredBatchId), uploadId: String(uploadId) }),
    // An upload is withdrawn once: a fresh one-part upload every 50 runs.
    prepare: refreshEvery(50, async () => {
      uploadId = await probeUpload(signer, measuredBatchId, 1, `FZW-${Date.now() % 1e6}-${uploads++}`);
    }),
    valid: () => ({ reason: 'Fuzz probe: sphere not calibrated.' }),
    extraKeyEvery: 5
  }
];

describe.each(cases().map((c) => [c.name, c] as const))('fuzzing %s', (_name, c) => {
  it('1,000 mutated bodies: no exception, and a refused body saves nothing', () => fuzzRoute(c), 300_000);
});
