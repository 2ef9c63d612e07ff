/** Rows of `package_models` ↔ camelCase records; list and get. Versions are never updated. */
import type { Knex } from 'knex';
import { db } from '../db/index';
import type { PackageModelFit } from '../../blend/calibration/fitPackageModel';
import type { PackageParameters } from '../../blend/calibration/packageLoadingModel';
import type { BuildInput } from './schema';

export interface PackageModelSummary {
  id: number;
  name: string;
  version: number;
  packageType: string;
  dispenseGeometry: 'fixedMass' | 'fixedVolume';
  pathLengthMm: number;
  dispenseMassMg: number | null;
  pumpMaterialId: number;
  pumpCode: string | null;
  phosphors: { materialId: number; code: string }[];
  cascade: boolean;
  rmsSteps: number;
  maxSteps: number;
  createdBy: number;
  createdByName: string | null;
  createdAt: Date;
}

/** What is stored for a fit: parameters with uncertainty, and the report without the spectra. */
export interface StoredParameters {
  parameters: PackageParameters;
  uncertainty: PackageParameters;
  fitted: { escape: boolean; iqeScale: boolean };
}
export type StoredFit = Omit<PackageModelFit, 'parameters' | 'uncertainty' | 'fitted'>;

export interface PackageModel extends PackageModelSummary {
  parameters: StoredParameters;
  fit: StoredFit;
  builds: BuildInput[];
}

type Row = Record<string, unknown>;
const SUMMARY = [
  'pm.id',
  'pm.name',
  'pm.version',
  'pm.package_type',
  'pm.dispense_geometry',
  'pm.path_length_mm',
  'pm.dispense_mass_mg',
  'pm.pump_material_id',
  'm.code as pump_code',
  'pm.phosphors_json',
  'pm.cascade',
  'pm.rms_steps',
  'pm.max_steps',
  'pm.created_by',
  'u.name as created_by_name',
  'pm.created_at'
];

function toSummary(r: Row): PackageModelSummary {
  return {
    id: Number(r.id),
    name: String(r.name),
    version: Number(r.version),
    packageType: String(r.package_type),
    dispenseGeometry: r.dispense_geometry === 'fixedVolume' ? 'fixedVolume' : 'fixedMass',
    pathLengthMm: Number(r.path_length_mm),
    dispenseMassMg: r.dispense_mass_mg == null ? null : Number(r.dispense_mass_mg),
    pumpMaterialId: Number(r.pump_material_id),
    pumpCode: r.pump_code == null ? null : String(r.pump_code),
    phosphors: JSON.parse(String(r.phosphors_json)),
    cascade: Boolean(r.cascade),
    rmsSteps: Number(r.rms_steps),
    maxSteps: Number(r.max_steps),
    createdBy: Number(r.created_by),
    createdByName: r.created_by_name == null ? null : String(r.created_by_name),
    createdAt: new Date(r.created_at as string | Date)
  };
}

const base = (k: Knex | Knex.Transaction) =>
  k('package_models as pm').leftJoin('materials as m', 'm.id', 'pm.pump_material_id').leftJoin('users as u', 'u.id', 'pm.created_by');

/** Every version, newest model first, versions descending. */
export async function list(): Promise<PackageModelSummary[]> {
  const rows: Row[] = await base(db()).orderBy('pm.name').orderBy('pm.version', 'desc').select(SUMMARY);
  return rows.map(toSummary);
}

export async function get(id: number, k: Knex | Knex.Transaction = db()): Promise<PackageModel | null> {
  const r: Row | undefined = await base(k)
    .where('pm.id', id)
    .first([...SUMMARY, 'pm.parameters_json', 'pm.fit_json', 'pm.builds_json']);
  if (!r) return null;
  return {
    ...toSummary(r),
    parameters: JSON.parse(String(r.parameters_json)),
    fit: JSON.parse(String(r.fit_json)),
    builds: JSON.parse(String(r.builds_json))
  };
}

/** Next version of a model name; locks the name's rows until the transaction ends. */
export async function nextVersion(trx: Knex.Transaction, name: string): Promise<number> {
  const rows: { version: number }[] = await trx('package_models').where({ name }).forUpdate().select('version');
  return rows.reduce((m, r) => Math.max(m, Number(r.version)), 0) + 1;
}
