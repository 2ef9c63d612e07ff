/**
 * Hostile input on the API routes that write records: 1,000 generated malformed bodies each for
 * creating a phosphor, a formulation (with its first draft) and a batch. No answer may be an
 * exception (a 500), and a refused body must leave every table of that feature exactly as it was
 * (no partial saves). Texts holding SQL metacharacters and script tags are stored literally.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as phosphorPost } from '../../../src/routes/api/v1/phosphors/+server';
import { POST as formulationPost } from '../../../src/routes/api/v1/formulations/+server';
import { POST as batchPost } from '../../../src/routes/api/v1/batches/+server';
import { db, closeDb } from '../../../src/lib/server/db/index';
import type { User } from '../../../src/lib/server/accounts/users';
import { apiEvent, fuzzRoute, lastMaterialId, removeProbeMaterials, userByEmail, type FuzzCase } from './fuzz-support';

let formulator: User;
let technician: User;
let approvedRevisionId: number;
let approvedContent: unknown;
let run = 0;
let lastMaterialBefore = 0;

beforeAll(async () => {
  formulator = await userByEmail('rhea.okafor@kestrelhollow.example');
  technician = await userByEmail('tomas.brand@kestrelhollow.example');
  const rev = (await db()('formulation_revisions').where({ state: 'approved' }).orderBy('id').first('id', 'content_json'))!;
  approvedRevisionId = rev.id;
  approvedContent = JSON.parse(rev.content_json);
  run = Date.now() % 1e6;
  lastMaterialBefore = await lastMaterialId();
});
afterAll(async () => {
  // Probe materials are unused, so they go; probe formulations and batches stay (records are permanent).
  await removeProbeMaterials(lastMaterialBefore);
  await closeDb();
});

const cases = (): FuzzCase[] => [
  {
    name: 'POST /api/v1/phosphors',
    handler: phosphorPost,
    user: () => formulator,
    tables: ['materials', 'material_spectra', 'material_lots', 'stored_files', 'audit_events'],
    valid: (i: number) => ({
      code: `FZ-${run}-${i}`,
      name: 'Fuzz probe phosphor',
      family: 'fuzz probe family',
      iqe: 0.9,
      densityGCm3: 4.5,
      costPerKg: 900
    })
  },
  {
    name: 'POST /api/v1/formulations',
    handler: formulationPost,
    user: () => formulator,
    tables: ['formulations', 'formulation_revisions', 'revision_signatures', 'audit_events'],
    valid: (i: number) => ({ code: `FZ-${run}-${i}`, name: `Fuzz probe ${run}-${i}`, description: 'fuzz', content: approvedContent })
  },
  {
    name: 'POST /api/v1/batches',
    handler: batchPost,
    user: () => technician,
    tables: ['batches', 'batch_lines', 'stored_files', 'audit_events'],
    valid: () => ({
      revisionId: approvedRevisionId,
      sizing: { kind: 'mass', batchMassG: 200 },
      loading: { mode: 'total', basis: 'wtPctOfSlurry', totalPct: 12 },
      additives: [],
      balance: { resolutionG: 0.01, minWeightG: 0.05 }
    })
  }
];

describe.each(cases().map((c) => [c.name, c] as const))('fuzzing %s', (_name, c) => {
  it('1,000 mutated bodies: no exception, and a refused body saves nothing', () => fuzzRoute(c), 300_000);
});

describe('hostile text is stored literally', () => {
  it('keeps SQL metacharacters and script tags as typed', async () => {
    const name = `<script>alert('x')</script>'; DROP TABLE materials; -- ${run}`;
    const res = await phosphorPost(apiEvent(formulator, { code: `FZ-LIT-${run}`, name, iqe: 0.9, notes: '" OR 1=1 -- \\ %_' }) as never);
    expect(res.status).toBe(201);
    const row = (await db()('materials')
      .where({ code: `FZ-LIT-${run}` })
      .first('name', 'notes'))!;
    expect(row.name).toBe(name);
    expect(row.notes).toBe('" OR 1=1 -- \\ %_');
  });
});
