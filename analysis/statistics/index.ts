export { meanVariance } from './mean-variance';
export type { MeanVariance } from './mean-variance';
export { orderStatisticsInPlace, medianInPlace } from './order-statistics';
export type { OrderStatistics } from './order-statistics';
export { summarize, summarizeInPlace } from './summary';
export type { FieldSummary } from './summary';
export { MAD_TO_SIGMA, MEAN_AD_TO_SIGMA, robustSpreadInPlace } from './median-absolute-deviation';
export type { RobustSpread } from './median-absolute-deviation';
export { sampleCovariance2 } from './covariance';
export type { Covariance2 } from './covariance';
export { eigenSymmetric2x2 } from './symmetric-eigen-2x2';
export type { SymmetricEigen2 } from './symmetric-eigen-2x2';
export {
  chiSquare2Quantile,
  fQuantile2,
  studentTCdf,
  studentTQuantile,
  fCdf,
  normalQuantile,
} from './distributions';
export { welchTTest } from './welch-t-test';
export type { SampleMoments, WelchResult } from './welch-t-test';
export { varianceRatioTest } from './variance-ratio-test';
export type { VarianceRatioResult } from './variance-ratio-test';
export { brownForsytheTest, spreadDifference } from './brown-forsythe-test';
export type { BrownForsytheResult, SpreadDifference } from './brown-forsythe-test';
