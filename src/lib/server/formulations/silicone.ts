/** The two-part silicone systems a revision can name. */
import { db } from '../db/index';

export interface SiliconeSystem {
  id: number;
  name: string;
  supplier: string | null;
  ratioA: number;
  ratioB: number;
  potLifeMin: number;
  cure: string;
  degasNotes: string | null;
  densityGPerCm3: number | null;
  refractiveIndex: number | null;
  safetyNote: string;
}

export async function listSiliconeSystems(): Promise<SiliconeSystem[]> {
  const rows = await db()('silicone_systems').orderBy('name');
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    supplier: r.supplier,
    ratioA: Number(r.ratio_a),
    ratioB: Number(r.ratio_b),
    potLifeMin: r.pot_life_min,
    cure: r.cure,
    degasNotes: r.degas_notes,
    densityGPerCm3: r.density_g_cm3 === null ? null : Number(r.density_g_cm3),
    refractiveIndex: r.refractive_index === null ? null : Number(r.refractive_index),
    safetyNote: r.safety_note
  }));
}

/** The handling notes of a silicone system shown beside a revision, or null when it is not on file. */
export async function siliconeHandling(id: number): Promise<{ safetyNote: string; degasNotes: string | null } | null> {
  const row = await db()('silicone_systems').where({ id }).first('safety_note', 'degas_notes');
  return row ? { safetyNote: row.safety_note as string, degasNotes: row.degas_notes as string | null } : null;
}
