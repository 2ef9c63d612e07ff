/**
 * Public API of the quality computations (pure TypeScript; no DOM, database or I/O):
 * per-part metrics and verdicts, ANSI C78.377 binning, MacAdam-type steps, batch summary,
 * histograms, predicted-vs-measured offsets, plot outlines and the blend correction.
 */
export type * from './types';
export { SUMMARY_QUANTITIES } from './types';
export { partMetrics } from './partMetrics';
export {
  measureParts,
  measurePartsPaced,
  measurePartsStepwise,
  MAX_PARTS_PER_UPLOAD,
  type PartColumns,
  type PartError,
  type MeasureResult
} from './measureParts';
export { qualityTarget } from './target';
export { judgePart, floorFailures, colourFailure, describeTolerance } from './acceptance';
export { describe as describeValues } from './statistics';
export { histogram, niceStep } from './histogram';
export { predictedVsMeasured, colourPoint, type ColourPoint, type PredictionCheck } from './prediction';
export { batchPrediction, stepsFromPrediction, type BatchPrediction } from './bin-prediction';
export { summariseBatch, type BatchSummary } from './summarise';
export { ellipseOutline, toleranceOutline, planckianOutline, quadrangleOutline } from './outlines';
export { judgeBatch, defaultAcceptance, batchAcceptance, describeAcceptance, type JudgedBatch, type AcceptanceChoice } from './judgeBatch';
export {
  correctFromBatch,
  correctionRequest,
  correctedContent,
  revisionRecipe,
  DEFAULT_STEP_FRACTION,
  type BatchCorrection
} from './correction';
export { fitDomain, type PlotDomain } from './plotDomain';
export { chromaticityPlotModel, type ChromaticityPlotModel, type PlotPart, type PlotMarker } from './plotModel';
export { recordMeasurementSummary, type RecordSignature, type RecordMeasurementSummary } from './recordSummary';
export type * from './view';
