/** Rows of `materials` ↔ camelCase records; list and get queries. */
import type { Knex } from 'knex';
import { db } from '../db/index';
import type { MaterialRow } from '../db/tables';

export const MATERIAL_KINDS = ['pump', 'phosphor'] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];

export interface Material {
  id: number;
  kind: MaterialKind;
  code: string;
  name: string;
  family: string | null;
  supplier: string | null;
  peakNm: number | null;
  fwhmNm: number | null;
  densityGCm3: number | null;
  iqe: number | null;
  absorptionPerWtPctMm: number | null;
  absorptionReferenceNm: number | null;
  costPerKg: number | null;
  d50Um: number | null;
  notes: string | null;
  safetyNote: string | null;
  /** Comma-separated hazard codes ('' for none): ../../library/hazards.ts. */
  hazards: string;
  emissionSpectrumId: number | null;
  excitationSpectrumId: number | null;
  archivedAt: Date | null;
  version: number;
  createdBy: number | null;
  updatedBy: number | null;
  createdByName: string | null;
  updatedByName: string | null;
  createdAt: Date;
  updatedAt: Date;
}

/** Editable fields ↔ columns (one place, used by create, update and audit snapshots). */
export const EDITABLE_COLUMNS = {
  code: 'code',
  name: 'name',
  family: 'family',
  supplier: 'supplier',
  densityGCm3: 'density_g_cm3',
  iqe: 'iqe',
  absorptionPerWtPctMm: 'absorption_per_wt_pct_mm',
  absorptionReferenceNm: 'absorption_reference_nm',
  costPerKg: 'cost_per_kg',
  d50Um: 'd50_um',
  notes: 'notes',
  safetyNote: 'safety_note',
  hazards: 'hazards'
} as const;
export type EditableField = keyof typeof EDITABLE_COLUMNS;
export type MaterialFields = { [K in EditableField]: Material[K] };

type Row = Record<string, unknown>;
const num = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));

export function toMaterial(r: Row | MaterialRow): Material {
  return {
    id: Number(r.id),
    kind: r.kind as MaterialKind,
    code: String(r.code),
    name: String(r.name),
    family: (r.family as string) ?? null,
    supplier: (r.supplier as string) ?? null,
    peakNm: num(r.peak_nm),
    fwhmNm: num(r.fwhm_nm),
    densityGCm3: num(r.density_g_cm3),
    iqe: num(r.iqe),
    absorptionPerWtPctMm: num(r.absorption_per_wt_pct_mm),
    absorptionReferenceNm: num(r.absorption_reference_nm),
    costPerKg: num(r.cost_per_kg),
    d50Um: num(r.d50_um),
    notes: (r.notes as string) ?? null,
    safetyNote: (r.safety_note as string) ?? null,
    hazards: (r.hazards as string) ?? '',
    emissionSpectrumId: num(r.emission_spectrum_id),
    excitationSpectrumId: num(r.excitation_spectrum_id),
    archivedAt: (r.archived_at as Date) ?? null,
    version: Number(r.version),
    createdBy: num(r.created_by),
    updatedBy: num(r.updated_by),
    createdByName: ((r as Row).created_by_name as string) ?? null,
    updatedByName: ((r as Row).updated_by_name as string) ?? null,
    createdAt: r.created_at as Date,
    updatedAt: r.updated_at as Date
  };
}

export function fieldsToColumns(fields: Partial<MaterialFields>): Row {
  const out: Row = {};
  for (const [k, col] of Object.entries(EDITABLE_COLUMNS)) {
    if (k in fields) out[col] = fields[k as EditableField];
  }
  return out;
}

export function editableSnapshot(m: Material): MaterialFields {
  return Object.fromEntries(Object.keys(EDITABLE_COLUMNS).map((k) => [k, m[k as EditableField]])) as MaterialFields;
}

function baseQuery(q: Knex | Knex.Transaction) {
  return q('materials as m')
    .leftJoin('users as cu', 'cu.id', 'm.created_by')
    .leftJoin('users as uu', 'uu.id', 'm.updated_by')
    .select('m.*', 'cu.name as created_by_name', 'uu.name as updated_by_name');
}

export async function get(id: number, trx?: Knex.Transaction): Promise<Material | null> {
  const q = baseQuery(trx ?? db())
    .where('m.id', id)
    .first();
  if (trx) q.forUpdate();
  const row = await q;
  return row ? toMaterial(row) : null;
}

export async function getByCode(code: string): Promise<Material | null> {
  const row = await baseQuery(db()).where('m.code', code).first();
  return row ? toMaterial(row) : null;
}

export const SORT_KEYS = ['code', 'name', 'family', 'supplier', 'peakNm', 'fwhmNm', 'iqe', 'costPerKg', 'updatedAt'] as const;
export type SortKey = (typeof SORT_KEYS)[number];
const SORT_COLUMNS: Record<SortKey, string> = {
  code: 'm.code',
  name: 'm.name',
  family: 'm.family',
  supplier: 'm.supplier',
  peakNm: 'm.peak_nm',
  fwhmNm: 'm.fwhm_nm',
  iqe: 'm.iqe',
  costPerKg: 'm.cost_per_kg',
  updatedAt: 'm.updated_at'
};

export interface ListQuery {
  kind?: MaterialKind;
  search?: string;
  sort?: SortKey;
  dir?: 'asc' | 'desc';
  includeArchived?: boolean;
  limit?: number;
}

export async function list(query: ListQuery = {}): Promise<Material[]> {
  const q = baseQuery(db());
  if (query.kind) q.where('m.kind', query.kind);
  if (!query.includeArchived) q.whereNull('m.archived_at');
  const term = query.search?.trim();
  if (term) {
    const like = `%${term.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    q.where((w) =>
      w.whereILike('m.code', like).orWhereILike('m.name', like).orWhereILike('m.family', like).orWhereILike('m.supplier', like)
    );
  }
  const dir = query.dir === 'desc' ? 'desc' : 'asc';
  q.orderByRaw(`${SORT_COLUMNS[query.sort ?? 'code']} IS NULL, ${SORT_COLUMNS[query.sort ?? 'code']} ${dir}`).orderBy('m.id', 'asc');
  q.limit(query.limit ?? 500);
  return (await q).map(toMaterial);
}
