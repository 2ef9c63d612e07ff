/** Batch weigh-out: exact masses, allowed ranges, readings and slurry age (pure; no I/O). */
export { Rat } from './rational';
export { largestRemainder } from './apportion';
export { computeWeighout, type LineRole, type PlannedLine, type WeighoutPlan, type WeighoutResult, type WeighoutIssue } from './compute';
export { checkActual, parseReadingG, type ActualCheck, type ActualStatus } from './actual';
export { slurryExpiry, slurryAge, type SlurryLimit, type SlurryAge } from './potlife';
export { scaleToMass, scaleByFactor } from './scale';
export * from './schema';
export {
  weighoutInputFromRevision,
  revisionLoadings,
  revisionLoadingsExact,
  DEFAULT_TOLERANCE,
  type FromRevisionResult
} from './from-revision';
export { describeTarget, type BatchTarget } from './target';
export { PAPER_SIZES, type PaperSize } from './paper';
