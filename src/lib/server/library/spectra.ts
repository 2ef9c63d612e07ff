/** Stored spectra of materials (`material_spectra`, append-only history; the material points at its current ones). */
import type { Knex } from 'knex';
import { db } from '../db/index';
import type { Spd } from '../../spectral/types';
import type { SpectrumKind, StoredSpectrum } from '../../library/types';
import type { Tm27Meta } from '../../spectrum-file/tm27';

export { SPECTRUM_KINDS, type SpectrumKind, type StoredSpectrum } from '../../library/types';

type Row = Record<string, unknown>;

function toSpectrum(r: Row, withData: boolean): StoredSpectrum {
  return {
    id: Number(r.id),
    materialId: Number(r.material_id),
    kind: r.kind as SpectrumKind,
    wavelengths: withData ? JSON.parse(String(r.wavelengths_json)) : [],
    values: withData ? JSON.parse(String(r.values_json)) : [],
    points: Number(r.points),
    minNm: Number(r.min_nm),
    maxNm: Number(r.max_nm),
    sourceFileId: r.source_file_id == null ? null : Number(r.source_file_id),
    sourceFileName: (r.original_name as string) ?? null,
    origin: String(r.origin),
    createdBy: r.created_by == null ? null : Number(r.created_by),
    createdByName: (r.user_name as string) ?? null,
    createdAt: r.created_at as Date,
    tm27: withData && typeof r.tm27_json === 'string' ? (JSON.parse(r.tm27_json) as Tm27Meta) : null
  };
}

const base = (q: Knex | Knex.Transaction) =>
  q('material_spectra as s').leftJoin('stored_files as f', 'f.id', 's.source_file_id').leftJoin('users as u', 'u.id', 's.created_by');

export async function insert(
  input: {
    materialId: number;
    kind: SpectrumKind;
    spd: Spd;
    sourceFileId: number | null;
    origin: 'upload' | 'api' | 'generated';
    createdBy: number | null;
    /** Header of an IES TM-27 source file, kept for export. */
    tm27?: Tm27Meta | null;
  },
  trx: Knex.Transaction
): Promise<number> {
  const { wavelengths, values } = input.spd;
  const [id] = await trx('material_spectra').insert({
    material_id: input.materialId,
    kind: input.kind,
    wavelengths_json: JSON.stringify(wavelengths),
    values_json: JSON.stringify(values),
    points: wavelengths.length,
    min_nm: wavelengths[0],
    max_nm: wavelengths[wavelengths.length - 1],
    source_file_id: input.sourceFileId,
    origin: input.origin,
    tm27_json: input.tm27 ? JSON.stringify(input.tm27) : null,
    created_by: input.createdBy
  });
  return id;
}

export async function get(id: number): Promise<StoredSpectrum | null> {
  const row = await base(db()).where('s.id', id).first('s.*', 'f.original_name', 'u.name as user_name');
  return row ? toSpectrum(row, true) : null;
}

/** Many spectra with their data, keyed by id (one query). */
export async function getMany(ids: number[]): Promise<Map<number, StoredSpectrum>> {
  if (ids.length === 0) return new Map();
  const rows: Row[] = await base(db()).whereIn('s.id', ids).select('s.*', 'f.original_name', 'u.name as user_name');
  return new Map(rows.map((r) => [Number(r.id), toSpectrum(r, true)]));
}

/** Upload history of a material, newest first, without the data arrays. */
export async function history(materialId: number): Promise<StoredSpectrum[]> {
  const rows: Row[] = await base(db())
    .where('s.material_id', materialId)
    .orderBy('s.created_at', 'desc')
    .orderBy('s.id', 'desc')
    .select(
      's.id',
      's.material_id',
      's.kind',
      's.points',
      's.min_nm',
      's.max_nm',
      's.source_file_id',
      's.origin',
      's.created_by',
      's.created_at',
      'f.original_name',
      'u.name as user_name'
    );
  return rows.map((r) => toSpectrum(r, false));
}
