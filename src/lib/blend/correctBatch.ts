/**
 * Request-level wrapper of `correctRecipe` for the API: prepares the component basis,
 * resolves the target (CCT/Duv, x,y or ANSI bin centre), turns measured spectra into x,y
 * with the core (CIE 1931 2°), and returns the correction plus the sensitivities at the
 * original recipe. See `correction.ts` for the method. A correction that does not converge or
 * needs a component at or below zero is refused (`CorrectionRefusedError`, API → 422).
 */
import { evaluateSpectrum } from '../spectral/evaluate';
import { prepareBasis } from './basis';
import { type CorrectionResult, correctRecipe } from './correction';
import { CorrectionRefusedError } from './correctionLimits';
import type { CorrectionRequest } from './schemas';
import { type Sensitivity, loadingSensitivities, opticalSensitivities } from './sensitivities';
import { resolveTarget } from '../aim/target';

export interface CorrectionResponse extends CorrectionResult {
  target: { x: number; y: number; cct: number; duv: number; label: string };
  sensitivities: Sensitivity[];
}

export function correctBatch(req: CorrectionRequest): CorrectionResponse {
  const basis = prepareBasis(req.components);
  const t = resolveTarget(req.target);
  const points =
    req.measured.kind === 'xy'
      ? req.measured.points
      : req.measured.spectra.map((s) => {
          const e = evaluateSpectrum(s, { cri: false, tm30: false });
          return { x: e.x, y: e.y };
        });
  const result = correctRecipe(basis, req.recipe, points, t, { stepFraction: req.stepFraction });
  if (result.refusal) throw new CorrectionRefusedError(result.refusal);
  const sensitivities =
    req.recipe.kind === 'optical'
      ? opticalSensitivities(basis, req.recipe.fractions)
      : loadingSensitivities(basis, req.recipe.concentrationsWtPct, req.recipe.loading);
  return { ...result, target: { x: t.x, y: t.y, cct: t.cct, duv: t.duv, label: t.label }, sensitivities };
}
