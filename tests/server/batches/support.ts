/**
 * Rows the batch tests need, created directly (formulations and materials are other features):
 * two phosphors with lots, a 10:1 silicone system, a formulation with an approved revision.
 * Codes carry a random suffix so test runs never collide. Values invented.
 */
import { db } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/accounts/users';
import type { User } from '../../../src/lib/server/accounts/users';
import type { RevisionContent } from '../../../src/lib/recipe';
import { withRecipeMatrix } from '../../fixtures/recipe-matrix';

export const DEMO_EMAILS = {
  technician: 'tomas.brand@kestrelhollow.example',
  technician2: 'mira.castellan@kestrelhollow.example',
  quality: 'ines.halloran@kestrelhollow.example',
  formulator: 'rhea.okafor@kestrelhollow.example',
  admin: 'admin@kestrelhollow.example'
} as const;
export const DEMO_PASSWORD = 'phosforge-demo';

export async function demoUser(key: keyof typeof DEMO_EMAILS): Promise<User> {
  const u = await users.findWithHashByEmail(DEMO_EMAILS[key]);
  if (!u) throw new Error(`demo user ${key} missing: run the tests in a seeded sandbox`);
  return u;
}

export interface Fixture {
  revisionId: number;
  draftRevisionId: number;
  green: { id: number; code: string; lot: string; expiredLot: string };
  red: { id: number; code: string; lot: string };
  siliconeSystemId: number;
  formulationCode: string;
}

/** `matrix`: the approved revision holds a recipe per chip bin (tests/fixtures/recipe-matrix.ts). */
export async function makeFixture(opts: { withWtPct?: boolean; matrix?: boolean } = {}): Promise<Fixture> {
  const k = db();
  const sfx = Math.random().toString(36).slice(2, 7).toUpperCase();
  const admin = await demoUser('admin');
  const mat = async (code: string, name: string) =>
    (await k('materials').insert({ kind: 'phosphor', code, name, family: 'test', created_by: admin.id }))[0];
  const greenCode = `TG-${sfx}`;
  const redCode = `TR-${sfx}`;
  const greenId = await mat(greenCode, 'test green garnet');
  const redId = await mat(redCode, 'test red nitride');
  await k('material_lots').insert([
    { material_id: greenId, lot_number: `LG-${sfx}-01`, supplier: 'Larkspur Luminescent Materials', expires_on: '2099-12-31' },
    { material_id: greenId, lot_number: `LG-${sfx}-00`, supplier: 'Larkspur Luminescent Materials', expires_on: '2020-01-31' },
    { material_id: redId, lot_number: `LR-${sfx}-01`, supplier: 'Tidewater Phosphor Works', expires_on: null }
  ]);
  const [siliconeSystemId] = await k('silicone_systems').insert({
    name: `Test 10:1 ${sfx}`,
    supplier: 'Brackenfield Silicones',
    ratio_a: 10,
    ratio_b: 1,
    pot_life_min: 240,
    cure: '1 h at 80 °C, then 2 h at 150 °C',
    degas_notes: 'Vacuum below 5 kPa for 15 min.',
    safety_note: 'Keep the crosslinker away from moisture.'
  });
  const code = `KH-T${sfx}`;
  const [formulationId] = await k('formulations').insert({ code, name: `Test warm white ${sfx}`, created_by: admin.id });
  const content: RevisionContent = {
    contentVersion: 1,
    pump: { materialId: greenId, code: 'B-450', name: 'blue pump' },
    phosphors: [
      { materialId: greenId, code: greenCode, name: 'test green garnet', opticalFraction: 0.4, wtPct: opts.withWtPct === false ? null : 7 },
      { materialId: redId, code: redCode, name: 'test red nitride', opticalFraction: 0.2, wtPct: opts.withWtPct === false ? null : 2.5 }
    ],
    pumpLeakFraction: 0.4,
    loading: null,
    silicone: {
      siliconeSystemId,
      name: `Test 10:1 ${sfx}`,
      ratioA: 10,
      ratioB: 1,
      potLifeMin: 240,
      cure: '1 h at 80 °C, then 2 h at 150 °C',
      densityGPerCm3: 1.05
    },
    target: { kind: 'cctDuv', cct: 3000, duv: 0 },
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: { raMin: 90 },
    notes: ''
  };
  const rev = (revision_no: number, state: 'approved' | 'draft') => ({
    formulation_id: formulationId,
    revision_no,
    state,
    content_json: JSON.stringify(opts.matrix ? withRecipeMatrix(content) : content),
    predicted_json: '{}',
    core_version: 'test',
    content_sha256: '0'.repeat(64),
    created_by: admin.id
  });
  const [revisionId] = await k('formulation_revisions').insert(rev(1, 'approved'));
  const [draftRevisionId] = await k('formulation_revisions').insert(rev(2, 'draft'));
  return {
    revisionId,
    draftRevisionId,
    siliconeSystemId,
    formulationCode: code,
    green: { id: greenId, code: greenCode, lot: `LG-${sfx}-01`, expiredLot: `LG-${sfx}-00` },
    red: { id: redId, code: redCode, lot: `LR-${sfx}-01` }
  };
}

/** The create request of the hand-worked 10:1 example (tests/lib/batches/weighout/compute.test.ts): 10.000 g, 7 + 2.5 wt %. */
export function request(revisionId: number) {
  return {
    revisionId,
    sizing: { kind: 'mass' as const, batchMassG: 10 },
    loading: { mode: 'perPhosphor' as const, basis: 'wtPctOfSlurry' as const },
    additives: [],
    balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-T1' },
    plantLimitMin: 120
  };
}
