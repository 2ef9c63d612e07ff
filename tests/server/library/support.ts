/** Helpers for the material-library integration tests (real MariaDB and the local S3 fake). */
import type { Knex } from 'knex';
import { db } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/accounts/users';
import type { Role } from '../../../src/lib/roles';
import type { User } from '../../../src/lib/server/accounts/users';

export const DEMO_EMAIL: Record<Role, string> = {
  formulator: 'rhea.okafor@kestrelhollow.example',
  technician: 'tomas.brand@kestrelhollow.example',
  quality: 'ines.halloran@kestrelhollow.example',
  admin: 'admin@kestrelhollow.example'
};

export async function demoUser(role: Role): Promise<User> {
  const u = await users.findWithHashByEmail(DEMO_EMAIL[role]);
  if (!u) throw new Error(`demo user for ${role} missing: run the sandbox seed`);
  return { id: u.id, email: u.email, name: u.name, active: u.active, roles: u.roles, createdAt: u.createdAt };
}

/** A Gaussian band exp(−((λ − centre)/w)²) every 5 nm over 380–780 nm, as CSV with a header. */
export function gaussianCsv(centreNm = 550, w = 40, sep = ',', step = 5): string {
  const lines = ['wavelength,intensity'.replace(',', sep)];
  for (let l = 380; l <= 780; l += step) lines.push(`${l}${sep}${Math.exp(-(((l - centreNm) / w) ** 2)).toFixed(6)}`);
  return lines.join('\n');
}

export const TEST_PREFIX = 'TST-';

export async function removeTestMaterials(): Promise<void> {
  const ids = (await db()('materials').where('code', 'like', `${TEST_PREFIX}%`).select('id')).map((r) => r.id as number);
  if (!ids.length) return;
  const lotIds = (await db()('material_lots').whereIn('material_id', ids).select('id')).map((r) => String(r.id));
  await db()('materials').whereIn('id', ids).update({ emission_spectrum_id: null, excitation_spectrum_id: null });
  await db()('material_spectra').whereIn('material_id', ids).delete();
  await db()('material_lots').whereIn('material_id', ids).delete();
  await db()('materials').whereIn('id', ids).delete();
  await db()('stored_files').where({ entity_type: 'material' }).whereIn('entity_id', ids.map(String)).delete();
  if (lotIds.length) await db()('stored_files').where({ entity_type: 'material-lot' }).whereIn('entity_id', lotIds).delete();
}

export async function counts(materialId: number) {
  const one = async <T extends object>(q: Knex.QueryBuilder<T>) => Number(((await q.count({ n: '*' }).first()) as { n: number }).n);
  return {
    spectra: await one(db()('material_spectra').where({ material_id: materialId })),
    files: await one(db()('stored_files').where({ entity_type: 'material', entity_id: String(materialId) })),
    version: Number((await db()('materials').where({ id: materialId }).first('version'))!.version),
    audit: await one(db()('audit_events').where({ entity_type: 'material', entity_id: String(materialId) }))
  };
}

export const phosphorFields = (code: string) => ({
  code,
  name: `${code} test garnet`,
  family: 'garnet, Ce-activated',
  supplier: 'Larkspur Luminescent Materials',
  densityGCm3: 4.6,
  iqe: 0.9,
  absorptionPerWtPctMm: 0.3,
  absorptionReferenceNm: 450,
  costPerKg: 150,
  d50Um: 15,
  notes: null,
  safetyNote: null,
  hazards: ''
});
