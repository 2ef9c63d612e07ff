/**
 * Lot statistics of a measured batch (pure): bin and verdict shares, process capability, the confidence
 * ellipse of the mean chromaticity and the trend over the run.
 */
export type * from './types';
export { capabilityIndices } from './capability';
export { fQuantileTwoNumeratorDf } from './f-quantile';
export { meanConfidenceEllipse, meanAndCovariance, hotellingScale, mahalanobisSquared, ellipseCovers } from './confidence-ellipse';
export { consecutiveGroups, groupStatistics, driftSlope, MAX_TREND_GROUPS } from './trend';
export { binShares, verdictShares, OUTSIDE_EVERY_BIN } from './counts';
export { lotCapability } from './lot-capability';
export { lotStatistics, trendSeries, ELLIPSE_LEVEL } from './lot-statistics';
