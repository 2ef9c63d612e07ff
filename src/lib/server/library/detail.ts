/** Everything the detail page and the API show about one material. */
import * as records from './records';
import * as spectra from './spectra';
import * as lots from './lots';
import * as attachments from './attachments';
import * as history from './history';
import { revisionsUsing, describeUse } from './usage';
import { summariseSpectrum, type SpectrumSummary } from '../../library/spectrum-summary';
import { SpectrumInputError } from '../../spectral/errors';
import type { Material } from './records';
import type { StoredSpectrum } from './spectra';

export interface MaterialDetail {
  material: Material;
  emission: StoredSpectrum | null;
  excitation: StoredSpectrum | null;
  summary: SpectrumSummary | null;
}

function summaryOf(s: StoredSpectrum | null): SpectrumSummary | null {
  if (!s) return null;
  try {
    return summariseSpectrum(s);
  } catch (err) {
    if (err instanceof SpectrumInputError) return null;
    throw err;
  }
}

export async function load(id: number): Promise<MaterialDetail | null> {
  const material = await records.get(id);
  if (!material) return null;
  const ids = [material.emissionSpectrumId, material.excitationSpectrumId].filter((x): x is number => x !== null);
  const spds = await spectra.getMany(ids);
  const emission = material.emissionSpectrumId ? (spds.get(material.emissionSpectrumId) ?? null) : null;
  const excitation = material.excitationSpectrumId ? (spds.get(material.excitationSpectrumId) ?? null) : null;
  return { material, emission, excitation, summary: summaryOf(emission) };
}

export async function loadPage(id: number) {
  const detail = await load(id);
  if (!detail) return null;
  const [lotList, documents, events, uploads, uses] = await Promise.all([
    lots.list(id),
    attachments.list(id),
    history.forMaterial(id),
    spectra.history(id),
    revisionsUsing(id)
  ]);
  return { ...detail, lots: lotList, documents, history: events, uploads, usedBy: uses.map(describeUse) };
}

/** JSON form of a material for the API (spectra included when given). */
export function toApi(m: Material, detail?: Pick<MaterialDetail, 'emission' | 'excitation' | 'summary'>) {
  const spd = (s: StoredSpectrum | null | undefined) =>
    s
      ? {
          id: s.id,
          wavelengths: s.wavelengths,
          values: s.values,
          points: s.points,
          sourceFileId: s.sourceFileId,
          origin: s.origin,
          createdAt: s.createdAt
        }
      : null;
  return {
    id: m.id,
    kind: m.kind,
    code: m.code,
    name: m.name,
    family: m.family,
    supplier: m.supplier,
    peakNm: m.peakNm,
    fwhmNm: m.fwhmNm,
    densityGCm3: m.densityGCm3,
    iqe: m.iqe,
    absorptionPerWtPctMm: m.absorptionPerWtPctMm,
    absorptionReferenceNm: m.absorptionReferenceNm,
    costPerKg: m.costPerKg,
    d50Um: m.d50Um,
    notes: m.notes,
    safetyNote: m.safetyNote,
    hazards: m.hazards,
    archived: m.archivedAt !== null,
    archivedAt: m.archivedAt,
    version: m.version,
    createdBy: m.createdByName,
    createdAt: m.createdAt,
    updatedBy: m.updatedByName,
    updatedAt: m.updatedAt,
    ...(detail ? { emission: spd(detail.emission), excitation: spd(detail.excitation), metrics: detail.summary } : {})
  };
}
