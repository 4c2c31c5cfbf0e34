export { LIE_DEG_PER_LENGTH_IN, lieChangeForLengthChangeDeg } from './lie-for-length';
export {
  GRAMS_PER_OUNCE,
  parseSwingWeight,
  SWING_WEIGHT_A0_IN_OZ,
  SWING_WEIGHT_FULCRUM_IN,
  SWING_WEIGHT_POINT_IN_OZ,
  swingWeightLabel,
  swingWeightPoints,
} from './swing-weight';
export {
  buildChangeEffect,
  HEAD_GRAMS_PER_SWING_WEIGHT_POINT,
  SWING_WEIGHT_POINTS_PER_LENGTH_IN,
  swingWeightChangeForHeadMass,
  swingWeightChangeForLength,
  type BuildChangeEffect,
} from './swing-weight-change';
export {
  defaultStaticFitTable,
  STATIC_FIT_RULE,
  staticFitRuleIn,
  staticFitStart,
  type StaticFitRow,
  type StaticFitStart,
  type StaticFitTable,
} from './static-fit';
