/**
 * Hostile input on the batch commands: 1,000 generated malformed bodies each for the weigh-out
 * preview, rescaling, recording a line, quality's signed acceptance of an out-of-range line, noting
 * the mixing time and completing a batch. No answer may be an exception (a 500), and a refused
 * body must leave the batch tables, stored files and audit trail exactly as they were.
 */
import { afterAll, beforeAll, describe, it } from 'vitest';
import { POST as previewPost } from '../../../src/routes/api/v1/batches/preview/+server';
import { POST as scalePost } from '../../../src/routes/api/v1/batches/[id]/scale/+server';
import { POST as linePost } from '../../../src/routes/api/v1/batches/[id]/lines/[seq]/+server';
import { POST as overridePost } from '../../../src/routes/api/v1/batches/[id]/lines/[seq]/override/+server';
import { POST as mixPost } from '../../../src/routes/api/v1/batches/[id]/mix/+server';
import { POST as completePost } from '../../../src/routes/api/v1/batches/[id]/complete/+server';
import { closeDb } from '../../../src/lib/server/db/index';
import { getBatch } from '../../../src/lib/server/batches/read';
import type { User } from '../../../src/lib/server/accounts/users';
import { fuzzRoute, refreshEvery, type FuzzCase } from './fuzz-support';
import {
  SIGNER_PASSWORD,
  type BatchStage,
  lineReading,
  probeApprovedRevision,
  probeBatch,
  probeSigner,
  retireSigner,
  technician,
  author,
  versionReader
} from './fuzz-probes';

const TABLES = ['batches', 'batch_lines', 'stored_files', 'audit_events'];

let tech: User;
let signer: User;
let revisionId: number;
/** The line targets: batch, line number and a valid reading. */
let lineTarget: { batchId: number; seq: number; actualG: string; lotNumber: string };
let overrideTarget: { batchId: number; seq: number };
let scaleBatchId: number;
const freshBatch = { mix: 0, complete: 0 };

beforeAll(async () => {
  tech = await technician();
  signer = await probeSigner();
  revisionId = await probeApprovedRevision(await author(), signer, 'batches');
  scaleBatchId = await probeBatch(tech, revisionId, 'planned');
  const planned = await probeBatch(tech, revisionId, 'planned');
  const line = (await getBatch(planned))!.lines.find((l) => l.materialId !== null)!;
  lineTarget = { batchId: planned, seq: line.seq, ...(await lineReading(line)) };
  const deviating = await probeBatch(tech, revisionId, 'outOfRange');
  overrideTarget = { batchId: deviating, seq: (await getBatch(deviating))!.lines.find((l) => l.actualStatus === 'above')!.seq };
}, 60_000);
afterAll(async () => {
  // Probe batches stay: batches are permanent records.
  await retireSigner();
  await closeDb();
});

const readBatchVersion = versionReader('batches');
const readLineVersion = versionReader('batch_lines');
const batchVersion = (id: number, last: number | undefined) => readBatchVersion({ id }, last);
const lineVersion = (t: { batchId: number; seq: number }, last: number | undefined) =>
  readLineVersion({ batch_id: t.batchId, seq: t.seq }, last);
const batchParams = (id: number) => ({ id: String(id) });
const lineParams = (t: { batchId: number; seq: number }) => ({ id: String(t.batchId), seq: String(t.seq) });

/** A once-per-batch command: a fresh batch at `stage` every `every` runs; the body names its version. */
function onFreshBatch(
  command: keyof typeof freshBatch,
  handler: FuzzCase['handler'],
  stage: BatchStage,
  every: number,
  body = () => ({})
): FuzzCase {
  return {
    name: `POST /api/v1/batches/[id]/${command}`,
    handler,
    user: () => tech,
    tables: TABLES,
    params: () => batchParams(freshBatch[command]),
    prepare: refreshEvery(every, async () => {
      freshBatch[command] = await probeBatch(tech, revisionId, stage);
    }),
    valid: async (_i, last) => ({ version: await batchVersion(freshBatch[command], last), ...body() })
  };
}

const cases = (): FuzzCase[] => [
  {
    name: 'POST /api/v1/batches/preview',
    handler: previewPost,
    user: () => tech,
    tables: TABLES,
    valid: () => ({
      revisionId,
      sizing: { kind: 'mass', batchMassG: 200 },
      loading: { mode: 'total', basis: 'wtPctOfSlurry', totalPct: 12 },
      siliconeTolerances: { a: { kind: 'pct', value: 1 }, b: { kind: 'g', value: 0.05 } },
      additives: [{ code: 'SIL-FS', name: 'fumed silica', pct: 0.5, tolerance: { kind: 'pct', value: 5 } }],
      balance: { resolutionG: 0.01, minWeightG: 0.05, ref: 'BAL-FZ' },
      plantLimitMin: 90,
      notes: 'fuzz probe'
    })
  },
  {
    name: 'POST /api/v1/batches/[id]/scale',
    handler: scalePost,
    user: () => tech,
    tables: TABLES,
    params: () => batchParams(scaleBatchId),
    valid: async (i, last) => ({
      version: await batchVersion(scaleBatchId, last),
      ...(i % 2 ? { batchMassG: 10 + (i % 7) } : { factor: 1 + (i % 3) / 10 })
    })
  },
  {
    name: 'POST /api/v1/batches/[id]/lines/[seq]',
    handler: linePost,
    user: () => tech,
    tables: TABLES,
    params: () => lineParams(lineTarget),
    valid: async (_i, last) => ({
      actualG: lineTarget.actualG,
      lotNumber: lineTarget.lotNumber,
      version: await lineVersion(lineTarget, last)
    })
  },
  {
    name: 'POST /api/v1/batches/[id]/lines/[seq]/override',
    handler: overridePost,
    user: () => signer,
    tables: TABLES,
    params: () => lineParams(overrideTarget),
    valid: async (_i, last) => ({
      reason: 'Fuzz probe: inside the colour window of the revision.',
      password: SIGNER_PASSWORD,
      version: await lineVersion(overrideTarget, last)
    })
  },
  // Noting the mixing time is once per batch: a fresh batch with part B read every 50 runs.
  onFreshBatch('mix', mixPost, 'partB', 50, () => ({ mixedAt: new Date().toISOString() })),
  // Completing is once per batch and builds the batch record PDF: a fresh mixed batch every 250 runs.
  onFreshBatch('complete', completePost, 'mixed', 250)
];

describe.each(cases().map((c) => [c.name, { extraKeyEvery: 5, ...c }] as const))('fuzzing %s', (_name, c) => {
  it('1,000 mutated bodies: no exception, and a refused body saves nothing', () => fuzzRoute(c), 300_000);
});
