/** Writes a fitted package model as the next version of its name, with its audit event, inside the caller's transaction. */
import type { Knex } from 'knex';
import * as audit from '../db/audit';
import type { PackageModelFit, PackageModelRef } from '../../blend/calibration/fitPackageModel';
import * as records from './records';
import type { PackageFitInput } from './schema';

export async function storeModel(
  trx: Knex.Transaction,
  actor: { id: number; email: string },
  input: PackageFitInput,
  fit: PackageModelFit,
  phosphors: { materialId: number; code: string }[]
): Promise<PackageModelRef> {
  const { parameters, uncertainty, fitted, ...report } = fit;
  const stored: records.StoredParameters = { parameters, uncertainty, fitted };
  const version = await records.nextVersion(trx, input.name);
  const [id] = await trx('package_models').insert({
    name: input.name,
    version,
    package_type: input.packageType,
    dispense_geometry: input.dispenseGeometry,
    path_length_mm: input.pathLengthMm,
    dispense_mass_mg: input.dispenseMassMg ?? null,
    pump_material_id: input.pumpId,
    phosphors_json: JSON.stringify(phosphors),
    cascade: input.cascade,
    parameters_json: JSON.stringify(stored),
    fit_json: JSON.stringify(report),
    builds_json: JSON.stringify(input.builds),
    rms_steps: fit.rmsSteps,
    max_steps: fit.maxSteps,
    created_by: actor.id
  });
  await audit.record(
    {
      actorId: actor.id,
      actorEmail: actor.email,
      entityType: 'package-model',
      entityId: id,
      action: 'create-by-fit',
      after: { name: input.name, version, parameters, uncertainty, rmsSteps: fit.rmsSteps, builds: input.builds.length }
    },
    trx
  );
  return { id, version };
}
