/**
 * Bay-file import: sniff a launch monitor's CSV export, suggest a mapping with every guess shown,
 * apply a recipe, and read the shots in canonical units (analysis/fields.ts).
 */
export { ImportError, type ImportErrorCode } from './import-error';
export {
  COLUMN_TARGETS,
  SIDE_NOTATIONS,
  recipeSchema,
  HANDED_FIELDS,
  isHandedTarget,
  type ColumnTarget,
  type Recipe,
  type RecipeColumn,
  type SideNotation,
} from './recipe';
export { sniff, disambiguateHeaders, type Delimiter, type SniffHints, type SniffResult } from './sniff';
export { suggestMapping, type AmbiguousColumn, type ColumnSuggestion, type MappingSuggestion } from './suggest-mapping';
export type { ImportWarning } from './unit-plausibility';
export { importBayFile, type ImportOptions, type ImportResult, type RejectedRow } from './import-bay-file';
export { parseClubName } from './club-name';
export { parseSide, detectSideNotation } from './side-notation';
export { parseHeader, matchHeaderName, type ParsedHeader } from './header-match';
export { detectNumberFormat, isFormulaLike, type DecimalMark } from './number-format';
export { deriveFields } from './derive-fields';
export { SHOT_LIMITS, FIELD_WORDS, shotValuesSchema, checkLimit, checkShotValues } from './shot-limits';
export { impactMisreadReason } from './impact-check';
