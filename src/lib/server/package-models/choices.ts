/** Package models as the designer offers them, and the check that a revision cites one that exists. */
import type { Knex } from 'knex';
import { db } from '../db/index';
import type { PackageModelChoice } from '../../designer/package-model';
import type { PackageModelRef } from '../../blend/calibration/fitPackageModel';
import type { StoredParameters } from './records';

type Row = Record<string, unknown>;

function toChoice(r: Row): PackageModelChoice {
  const stored = JSON.parse(String(r.parameters_json)) as StoredParameters;
  const phosphors = JSON.parse(String(r.phosphors_json)) as { materialId: number; code: string }[];
  return {
    id: Number(r.id),
    name: String(r.name),
    version: Number(r.version),
    packageType: String(r.package_type),
    pumpMaterialId: Number(r.pump_material_id),
    pathLengthMm: Number(r.path_length_mm),
    dispenseGeometry: r.dispense_geometry === 'fixedVolume' ? 'fixedVolume' : 'fixedMass',
    cascade: Boolean(r.cascade),
    phosphors: phosphors.map((p, i) => ({ ...p, absorptionPerWtPctMm: stored.parameters.absorptionPerWtPctMm[i] })),
    pumpEscape: stored.parameters.pumpEscape,
    iqeScale: stored.parameters.iqeScale
  };
}

const COLUMNS = [
  'id',
  'name',
  'version',
  'package_type',
  'pump_material_id',
  'path_length_mm',
  'dispense_geometry',
  'cascade',
  'phosphors_json',
  'parameters_json'
];

/** Every version of every package model, by name, newest version first. */
export async function packageModelChoices(k: Knex | Knex.Transaction = db()): Promise<PackageModelChoice[]> {
  const rows: Row[] = await k('package_models').orderBy('name').orderBy('version', 'desc').select(COLUMNS);
  return rows.map(toChoice);
}

/** The cited model's name, or null when no package model has that id and version. */
export async function citedPackageModel(
  ref: PackageModelRef,
  k: Knex | Knex.Transaction = db()
): Promise<{ name: string; version: number } | null> {
  const row = await k('package_models').where({ id: ref.id, version: ref.version }).first('name', 'version');
  return row ? { name: String(row.name), version: Number(row.version) } : null;
}
