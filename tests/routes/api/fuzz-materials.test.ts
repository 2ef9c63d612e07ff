/**
 * Hostile input on the material library's JSON routes: 1,000 generated malformed bodies each for
 * editing a phosphor, creating a pump and editing a pump. No answer may be an exception (a 500),
 * and a refused body must leave the library tables and the audit trail exactly as they were.
 */
import { afterAll, beforeAll, describe, it } from 'vitest';
import { PUT as phosphorPut } from '../../../src/routes/api/v1/phosphors/[id]/+server';
import { POST as pumpPost } from '../../../src/routes/api/v1/pumps/+server';
import { PUT as pumpPut } from '../../../src/routes/api/v1/pumps/[id]/+server';
import { closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import type { User } from '../../../src/lib/server/accounts/users';
import { fuzzRoute, lastMaterialId, removeProbeMaterials, type FuzzCase } from './fuzz-support';
import { author, versionReader } from './fuzz-probes';

const TABLES = ['materials', 'material_spectra', 'material_lots', 'stored_files', 'audit_events'];

let rhea: User;
let run = 0;
/** Materials with a higher id were made by this file (a mutated code may not keep the FZM- prefix). */
let lastIdBefore = 0;
let phosphorId: number;
let pumpId: number;
const readVersion = versionReader('materials');

const fields = (code: string, kind: 'phosphor' | 'pump') => ({
  code,
  name: `Fuzz probe ${kind}`,
  family: kind === 'pump' ? 'InGaN' : 'garnet, Ce-activated',
  supplier: 'Larkspur Luminescent Materials',
  densityGCm3: kind === 'pump' ? null : 4.6,
  iqe: kind === 'pump' ? null : 0.9,
  absorptionPerWtPctMm: null,
  absorptionReferenceNm: null,
  costPerKg: 150,
  d50Um: null,
  notes: 'fuzz probe',
  safetyNote: null,
  hazards: ''
});

beforeAll(async () => {
  rhea = await author();
  run = Date.now() % 1e6;
  lastIdBefore = await lastMaterialId();
  phosphorId = await editing.create(rhea, 'phosphor', fields(`FZM-P-${run}`, 'phosphor'));
  pumpId = await editing.create(rhea, 'pump', fields(`FZM-U-${run}`, 'pump'));
});
afterAll(async () => {
  // Probe materials are used by nothing, so they go.
  await removeProbeMaterials(lastIdBefore);
  await closeDb();
});

/** Editing one probe: the body names the version read, and a cost that differs from run to run so each accepted edit changes the row. */
const edit = (kind: 'phosphor' | 'pump', handler: FuzzCase['handler'], id: () => number): FuzzCase => ({
  name: `PUT /api/v1/${kind}s/[id]`,
  handler,
  method: 'PUT',
  user: () => rhea,
  tables: TABLES,
  params: () => ({ id: String(id()) }),
  valid: async (i, last) => ({
    version: await readVersion({ id: id() }, last),
    costPerKg: 100 + i,
    notes: `fuzz probe edit ${i}`,
    d50Um: 12.5
  })
});

const cases = (): FuzzCase[] => [
  edit('phosphor', phosphorPut, () => phosphorId),
  {
    name: 'POST /api/v1/pumps',
    handler: pumpPost,
    user: () => rhea,
    tables: TABLES,
    valid: (i) => ({ ...fields(`FZM-${run}-${i}`, 'pump'), absorptionReferenceNm: 450 })
  },
  edit('pump', pumpPut, () => pumpId)
];

describe.each(cases().map((c) => [c.name, c] as const))('fuzzing %s', (_name, c) => {
  it('1,000 mutated bodies: no exception, and a refused body saves nothing', () => fuzzRoute(c), 300_000);
});
