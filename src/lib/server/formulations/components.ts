/**
 * Loads the pump and phosphors a revision names from the materials tables as blend components
 * (spectra from material_spectra), and refreshes the copied code/name and silicone details so the
 * stored record matches the library at save time. Takes the Knex handle so seeds can use it too.
 */
import type { Knex } from 'knex';
import type { BlendComponents, PhosphorSpec, Spd } from '../../blend/types';
import type { RevisionContent } from '../../recipe';
import { ValidationError } from './errors';

interface MaterialRow {
  id: number;
  kind: 'pump' | 'phosphor';
  code: string;
  name: string;
  family: string | null;
  iqe: number | null;
  absorption_per_wt_pct_mm: number | null;
  absorption_reference_nm: number | null;
  density_g_cm3: number | null;
  cost_per_kg: number | null;
  emission_spectrum_id: number | null;
  excitation_spectrum_id: number | null;
}

async function spectra(knex: Knex, ids: number[]): Promise<Map<number, Spd>> {
  const rows: { id: number; wavelengths_json: string; values_json: string }[] = ids.length
    ? await knex('material_spectra').whereIn('id', ids).select('id', 'wavelengths_json', 'values_json')
    : [];
  return new Map(rows.map((r) => [r.id, { wavelengths: JSON.parse(r.wavelengths_json), values: JSON.parse(r.values_json) }]));
}

export interface LoadedComponents {
  components: BlendComponents;
  content: RevisionContent;
}

export async function loadRevisionComponents(knex: Knex, content: RevisionContent): Promise<LoadedComponents> {
  const phosphorIds = content.phosphors.map((p) => p.materialId);
  if (new Set(phosphorIds).size !== phosphorIds.length) throw new ValidationError('phosphors: each phosphor may appear only once');
  const rows: MaterialRow[] = await knex('materials').whereIn('id', [content.pump.materialId, ...phosphorIds]);
  const byId = new Map(rows.map((r) => [r.id, r]));
  const pumpRow = byId.get(content.pump.materialId);
  if (!pumpRow || pumpRow.kind !== 'pump')
    throw new ValidationError(`pump: material ${content.pump.materialId} is not a pump in the library`);
  const phosphorRows = phosphorIds.map((id, i) => {
    const row = byId.get(id);
    if (!row || row.kind !== 'phosphor') throw new ValidationError(`phosphors.${i}: material ${id} is not a phosphor in the library`);
    return row;
  });
  const spectrumIds = rows.flatMap((r) => [r.emission_spectrum_id, r.excitation_spectrum_id]).filter((v): v is number => v !== null);
  const spd = await spectra(knex, spectrumIds);
  const emission = (r: MaterialRow) => {
    const s = r.emission_spectrum_id === null ? undefined : spd.get(r.emission_spectrum_id);
    if (!s) throw new ValidationError(`${r.code} has no emission spectrum in the library; add one before using it in a revision`);
    return s;
  };
  const phosphors: PhosphorSpec[] = phosphorRows.map((r) => ({
    id: String(r.id),
    name: r.name,
    family: r.family ?? undefined,
    emission: emission(r),
    excitation: r.excitation_spectrum_id === null ? undefined : spd.get(r.excitation_spectrum_id),
    // IQE does not enter the optical-superposition prediction (fractions are output power shares).
    iqe: r.iqe ?? 1,
    absorptionPerWtPctMm: r.absorption_per_wt_pct_mm ?? undefined,
    absorptionReferenceNm: r.absorption_reference_nm ?? undefined,
    densityGPerCm3: r.density_g_cm3 ?? undefined,
    costPerKg: r.cost_per_kg ?? undefined
  }));
  const refreshed: RevisionContent = {
    ...content,
    pump: { materialId: pumpRow.id, code: pumpRow.code, name: pumpRow.name },
    phosphors: content.phosphors.map((p, i) => ({ ...p, code: phosphorRows[i].code, name: phosphorRows[i].name })),
    silicone: await refreshedSilicone(knex, content.silicone)
  };
  return {
    components: { pump: { id: String(pumpRow.id), name: pumpRow.name, spectrum: emission(pumpRow) }, phosphors },
    content: refreshed
  };
}

async function refreshedSilicone(knex: Knex, s: RevisionContent['silicone']): Promise<RevisionContent['silicone']> {
  if (s.siliconeSystemId === null) return s;
  const row = await knex('silicone_systems').where({ id: s.siliconeSystemId }).first();
  if (!row) throw new ValidationError(`silicone: system ${s.siliconeSystemId} is not in the list of silicone systems`);
  return {
    siliconeSystemId: row.id,
    name: row.name,
    ratioA: Number(row.ratio_a),
    ratioB: Number(row.ratio_b),
    potLifeMin: row.pot_life_min,
    cure: row.cure,
    densityGPerCm3: row.density_g_cm3 === null ? null : Number(row.density_g_cm3)
  };
}
