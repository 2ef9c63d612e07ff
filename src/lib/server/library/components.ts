/**
 * Library materials as blend-model components (contract shared with the designer, formulations,
 * batches and quality). `id` of each spec is String(material id). Archived materials still load,
 * so approved formulations keep working after a material leaves the active library.
 */
import { db } from '../db/index';
import { notFound as notFoundError, unprocessable } from '../../errors/domain-error';
import * as records from './records';
import * as spectra from './spectra';
import type { PhosphorSpec, PumpSpec } from '../../blend/types';
import type { MaterialKind } from './records';

export interface MaterialOption {
  id: number;
  code: string;
  name: string;
  family: string | null;
  peakNm: number | null;
  /** False until an emission spectrum is uploaded: the blend model cannot use the material yet. */
  hasSpectrum: boolean;
}

export async function listMaterialOptions(kind: MaterialKind): Promise<MaterialOption[]> {
  const rows: {
    id: number;
    code: string;
    name: string;
    family: string | null;
    peak_nm: number | null;
    emission_spectrum_id: number | null;
  }[] = await db()('materials')
    .where({ kind })
    .whereNull('archived_at')
    .orderByRaw('peak_nm IS NULL, peak_nm')
    .orderBy('code')
    .select('id', 'code', 'name', 'family', 'peak_nm', 'emission_spectrum_id');
  return rows.map((r) => ({
    id: r.id,
    code: r.code,
    name: r.name,
    family: r.family,
    peakNm: r.peak_nm == null ? null : Number(r.peak_nm),
    hasSpectrum: r.emission_spectrum_id !== null
  }));
}

export async function loadBlendComponents(pumpId: number, phosphorIds: number[]): Promise<{ pump: PumpSpec; phosphors: PhosphorSpec[] }> {
  const ids = [pumpId, ...phosphorIds];
  const rows = await db()('materials').whereIn('id', ids).select('*');
  const byId = new Map(rows.map((r) => [Number(r.id), records.toMaterial(r)]));
  const spectrumIds = [...byId.values()]
    .flatMap((m) => [m.emissionSpectrumId, m.excitationSpectrumId])
    .filter((x): x is number => x !== null);
  const spds = await spectra.getMany(spectrumIds);
  const spdOf = (id: number | null) => (id === null ? undefined : spds.get(id));
  const need = (id: number, kind: MaterialKind) => {
    const m = byId.get(id);
    if (!m) throw notFoundError(`Material ${id} was not found.`);
    if (m.kind !== kind) throw unprocessable(`${m.code} is a ${m.kind}, not a ${kind}.`);
    const emission = spdOf(m.emissionSpectrumId);
    if (!emission) throw unprocessable(`${m.code} has no emission spectrum yet; upload one in the library first.`);
    return { m, emission: { wavelengths: emission.wavelengths, values: emission.values } };
  };
  const pump = need(pumpId, 'pump');
  return {
    pump: { id: String(pump.m.id), name: pump.m.name, spectrum: pump.emission },
    phosphors: phosphorIds.map((id) => {
      const { m, emission } = need(id, 'phosphor');
      if (m.iqe === null) throw unprocessable(`${m.code} has no IQE; enter it in the library first.`);
      const excitation = spdOf(m.excitationSpectrumId);
      const spec: PhosphorSpec = { id: String(m.id), name: m.name, emission, iqe: m.iqe };
      if (m.family) spec.family = m.family;
      if (excitation) spec.excitation = { wavelengths: excitation.wavelengths, values: excitation.values };
      if (m.absorptionPerWtPctMm !== null) spec.absorptionPerWtPctMm = m.absorptionPerWtPctMm;
      if (m.absorptionReferenceNm !== null) spec.absorptionReferenceNm = m.absorptionReferenceNm;
      if (m.densityGCm3 !== null) spec.densityGPerCm3 = m.densityGCm3;
      if (m.costPerKg !== null) spec.costPerKg = m.costPerKg;
      return spec;
    })
  };
}
