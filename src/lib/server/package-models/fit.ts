/**
 * Fit a package model from builds and store it as the next version of its name (store.ts: one
 * transaction with its audit event). A fit that is refused (not identifiable, bad spectrum) or
 * does not converge saves nothing and says why.
 */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { DomainError, conflict, unprocessable } from '../../errors/domain-error';
import { loadBlendComponents } from '../library/components';
import { prepareBasis, tristimulus } from '../../blend/basis';
import { toGrid } from '../../blend/grid';
import { xyzToXy } from '../../spectral/colorimetry/chromaticity';
import { fitPackageModel, type PackageModelFit } from '../../blend/calibration/fitPackageModel';
import type { PackageBuild } from '../../blend/calibration/packageBuilds';
import type { User } from '../accounts/users';
import { storeModel } from './store';
import type { BuildInput, PackageFitInput } from './schema';

/** Start value for a phosphor without a library absorption coefficient [invented; the fit moves it]. */
const DEFAULT_START_ALPHA = 0.1;

export function toPackageBuild(b: BuildInput): PackageBuild {
  const spd = b.spectrum ? toGrid(b.spectrum) : undefined;
  const xy: [number, number] = b.x !== undefined && b.y !== undefined ? [b.x, b.y] : xyzToXy(...tristimulus(spd!));
  return {
    label: b.label,
    concentrationsWtPct: b.concentrationsWtPct,
    measuredXy: xy,
    ...(spd ? { measuredSpd: spd } : {}),
    ...(b.pathLengthMm !== undefined ? { pathLengthMm: b.pathLengthMm } : {}),
    ...(b.dispenseMassMg !== undefined ? { dispenseMassMg: b.dispenseMassMg } : {}),
    ...(b.outputWPerPumpW !== undefined ? { outputWPerPumpW: b.outputWPerPumpW } : {}),
    ...(b.outputLmPerPumpW !== undefined ? { outputLmPerPumpW: b.outputLmPerPumpW } : {})
  };
}

async function components(input: PackageFitInput) {
  try {
    return await loadBlendComponents(input.pumpId, input.phosphorIds);
  } catch (err) {
    if (err instanceof DomainError && err.kind === 'not_found') throw unprocessable(err.message);
    throw err;
  }
}

/** The fit alone (no database write); throws an unprocessable domain error (422) when it is refused or does not converge. */
export async function runFit(input: PackageFitInput): Promise<PackageModelFit> {
  const spec = await components(input);
  if (input.dispenseGeometry === 'fixedVolume') {
    const missing = spec.phosphors.filter((p) => !(p.densityGPerCm3 && p.densityGPerCm3 > 0)).map((p) => p.name);
    if (missing.length) {
      const names = missing.join(', ');
      throw unprocessable(
        `A cavity filled to a fixed volume needs each phosphor's density; the library has none for ${names}. Add it, or choose fixedMass.`
      );
    }
  }
  const start = {
    ...spec,
    phosphors: spec.phosphors.map((p) => ({ ...p, absorptionPerWtPctMm: p.absorptionPerWtPctMm ?? DEFAULT_START_ALPHA }))
  };
  const basis = prepareBasis(start).loading!;
  const fit = fitPackageModel(
    basis,
    input.builds.map(toPackageBuild),
    {
      pathLengthMm: input.pathLengthMm,
      ...(input.dispenseMassMg !== undefined ? { dispenseMassMg: input.dispenseMassMg } : {}),
      cascade: input.cascade,
      geometry: input.dispenseGeometry,
      fitEscape: input.fitEscape,
      fitIqeScale: input.fitIqeScale
    },
    input.bootstrap.resamples > 0 ? input.bootstrap : false
  );
  if (!fit.converged) {
    throw unprocessable(
      `The fit did not converge (${fit.reason} after ${fit.iterations} iterations). ` +
        `Nothing was saved: check the builds, or fit fewer parameters.`
    );
  }
  return fit;
}

export async function createByFit(actor: User, input: PackageFitInput): Promise<number> {
  const fit = await runFit(input);
  const codes: { id: number; code: string }[] = await db()('materials').whereIn('id', input.phosphorIds).select('id', 'code');
  const phosphors = input.phosphorIds.map((id) => ({ materialId: id, code: codes.find((c) => Number(c.id) === id)?.code ?? String(id) }));
  try {
    const ref = await writeTransaction((trx) => storeModel(trx, actor, input, fit, phosphors));
    return ref.id;
  } catch (err) {
    const code = (err as { code?: string })?.code;
    if (code === 'ER_DUP_ENTRY' || code === 'ER_LOCK_DEADLOCK') {
      throw conflict(
        `Another fit of ${input.name} was saved at the same moment. Nothing was saved: run the fit again to save the next version.`
      );
    }
    throw err;
  }
}
