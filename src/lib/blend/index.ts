/**
 * Public API of the Phosforge blend model and solver (pure TypeScript).
 * Models: optical superposition (Ohno, Opt. Eng. 44 (2005) 111302) and a Beer–Lambert
 * loading model with optional first-order cascade; calibration by Levenberg–Marquardt;
 * solver by equal-chromaticity polytope + Nelder–Mead. See each module's header.
 */
export type * from './types';
export { mix, type MixRatios, type MixResult } from './mix';
export { solveBlend, type SolveProblem, type SolveResult, type SolveStatus } from './solver/solveBlend';
export type { SolveCandidate, CandidateComponent } from './solver/buildCandidate';
export { correctRecipe, type Recipe, type CorrectionResult } from './correction';
export { correctBatch, type CorrectionResponse } from './correctBatch';
export { opticalSensitivities, loadingSensitivities, type Sensitivity } from './sensitivities';
export { prepareBasis, type Basis, type PreparedComponent } from './basis';
export { beerLambertPhotonBudget, type LoadingResult } from './loading/beerLambertPhotonBudget';
export {
  concentrationsForFractions,
  requireConcentrations,
  LoadingRefusedError,
  type ConcentrationSolution
} from './loading/concentrationsForFractions';
export { type DispenseGeometry, volumeFractions, slurryDensityGPerCm3 } from './loading/dispenseGeometry';
export { calibrateAbsorption, type CalibrationReport, type CalibrationBuild } from './calibration/calibrateAbsorption';
export { calibrateFromBuilds, type MeasuredBuild } from './calibration/calibrateFromBuilds';
export { fitPackageModel, type PackageModelFit, type PackageModelRef } from './calibration/fitPackageModel';
export { phosphorCostPer1000Lm, type CostBasis } from './solver/phosphorCost';
export {
  mixRequestSchema,
  solveProblemSchema,
  correctionRequestSchema,
  spdSchema,
  pumpSchema,
  phosphorSchema,
  loadingParamsSchema,
  recipeSchema,
  type MixRequest,
  type SolveProblemInput,
  type CorrectionRequest
} from './schemas';
export { DEMO_PUMPS, DEMO_PHOSPHORS, BLUE_PUMP, VIOLET_PUMP, demoPhosphor, type DemoPhosphor } from './demo-components';
export { BlendInputError } from './errors';
