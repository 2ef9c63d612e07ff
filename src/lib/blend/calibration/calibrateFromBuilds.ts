/**
 * Request-level wrapper of `calibrateAbsorption`: measured builds given as JSON spectra,
 * components as specs. Phosphors without `absorptionPerWtPctMm` start from 0.1 per
 * (wt %·mm) [invented start value; the fit moves it].
 */
import { BlendInputError } from '../errors';
import { prepareBasis } from '../basis';
import { toGrid } from '../grid';
import type { BlendComponents, LoadingParams, Spd } from '../types';
import { type CalibrationReport, calibrateAbsorption } from './calibrateAbsorption';

export interface MeasuredBuild {
  concentrationsWtPct: number[];
  spd: Spd;
}

export function calibrateFromBuilds(components: BlendComponents, builds: MeasuredBuild[], loading: LoadingParams): CalibrationReport {
  const withStart: BlendComponents = {
    ...components,
    phosphors: components.phosphors.map((p) => ({ ...p, absorptionPerWtPctMm: p.absorptionPerWtPctMm ?? 0.1 }))
  };
  const basis = prepareBasis(withStart);
  if (!basis.loading) throw new BlendInputError('calibration: loading basis could not be built');
  return calibrateAbsorption(
    basis.loading,
    builds.map((b) => ({ concentrationsWtPct: b.concentrationsWtPct, measured: toGrid(b.spd) })),
    { pathLengthMm: loading.pathLengthMm, cascade: loading.cascade, cascadePathFactor: loading.cascadePathFactor }
  );
}
