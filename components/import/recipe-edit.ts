/**
 * The mapping step's edits, as pure functions: what a column may be set to, which units and side
 * notations fit it, and the column overrides sent to the server as `options.recipe.columns`.
 */
import { FIELD_LABELS, SIDE_FIELDS, type ShotField } from '@/analysis/fields';
import type { ColumnSuggestion } from '@/analysis/import';
// The recipe's lists straight from their file, as server/schemas does: the family's index would
// bring the whole file reader (and papaparse) into every page of the web app.
import { COLUMN_TARGETS, isHandedTarget, SIDE_NOTATIONS, type ColumnTarget, type Recipe, type RecipeColumn, type SideNotation } from '@/analysis/import/recipe';
import { CANONICAL_UNIT, fieldDimension, findUnit, UNITS } from '@/analysis/units';

/** Column overrides by header as the file writes it (the recipe's `columns`). */
export type ColumnOverrides = Readonly<Record<string, RecipeColumn>>;

/** Readable names for what a column may hold; trade terms as the trade says them. */
export const TARGET_LABELS: Readonly<Record<ColumnTarget, string>> = {
  club: 'Club',
  build: 'Build',
  ignore: 'Ignore',
  ...FIELD_LABELS,
};

/** The targets in picker order: club, build, the shot fields, ignore last. */
export const TARGET_OPTIONS: readonly { value: ColumnTarget; label: string }[] = [
  'club',
  'build',
  ...COLUMN_TARGETS.filter((t) => t !== 'club' && t !== 'build' && t !== 'ignore'),
  'ignore',
].map((value) => ({ value: value as ColumnTarget, label: TARGET_LABELS[value as ColumnTarget] }));

/** How each side notation reads, by example ('+' is right in Ovalyard). */
export const SIDE_LABELS: Readonly<Record<SideNotation, string>> = {
  'suffix-LR': '12.3 L / 4.5 R',
  'prefix-LR': 'L 12.3 / R 4.5',
  'signed-right-positive': '+ is right',
  'signed-left-positive': '+ is left',
};

export const SIDE_OPTIONS: readonly { value: SideNotation; label: string }[] = SIDE_NOTATIONS.map((value) => ({
  value,
  label: SIDE_LABELS[value],
}));

/** Whose left and right a signed column is written for (recipe `handed`). */
export const HAND_OPTIONS: readonly { value: 'target' | 'hand'; label: string }[] = [
  { value: 'target', label: 'Same for both hands' },
  { value: 'hand', label: "For the player's hand" },
];

/**
 * Fields a file commonly writes for the player's hand (in-to-out and open positive): the mapping
 * step asks about these for a left-handed player. Where the ball starts, curves and ends is
 * written on the ground (common practice, no source); a recipe may still mark any left/right field.
 */
export const ASK_HAND_FIELDS: ReadonlySet<ColumnTarget> = new Set<ColumnTarget>(['clubPath', 'faceAngle', 'faceToPath']);

/** Whether a column may be marked as written for the player's hand: a handed field, read from signed numbers. */
export function mayBeHanded(column: RecipeColumn): boolean {
  return isHandedTarget(column.field) && column.side !== 'suffix-LR' && column.side !== 'prefix-LR';
}

export function isShotTarget(target: ColumnTarget): target is ShotField {
  return target !== 'club' && target !== 'build' && target !== 'ignore';
}

/** Whether a column of this target has a left/right side (offline, launch direction, path…). */
export function isSideTarget(target: ColumnTarget): boolean {
  return isShotTarget(target) && SIDE_FIELDS.has(target);
}

/**
 * The units a column of this target may be in: those of its field's dimension (none for club,
 * build and ignore). Radians and milliseconds stay in the list: some files write them.
 */
export function unitOptionsFor(target: ColumnTarget): { value: string; label: string }[] {
  if (!isShotTarget(target)) return [];
  const dimension = fieldDimension(target);
  if (dimension === 'ratio') return [];
  return UNITS.filter((u) => u.dimension === dimension).map((u) => ({ value: u.unit, label: u.label || u.unit }));
}

/** Whether `unit` (any alias) is a unit of `target`'s dimension. */
export function unitFits(target: ColumnTarget, unit: string | null | undefined): boolean {
  if (!isShotTarget(target) || !unit) return false;
  const info = findUnit(unit);
  return info !== null && info.dimension === fieldDimension(target);
}

/** Our name for a unit written any way ('yds' → 'yd'), or null when unknown. */
export function unitName(unit: string | null | undefined): string | null {
  return unit ? (findUnit(unit)?.unit ?? null) : null;
}

/**
 * A column set to `field`. A unit that fits the new field is kept; otherwise the suggestion's
 * stated unit when it fits, else the canonical unit of the field's dimension. A side notation
 * is kept only for a left/right field (defaulting to the suggestion's or "+ is right").
 */
export function columnWithField(current: RecipeColumn | null, field: ColumnTarget, suggestion?: ColumnSuggestion): RecipeColumn {
  if (!isShotTarget(field)) return { field };
  const next: RecipeColumn = { field };
  const candidates = [current?.unit, suggestion?.unit];
  const fitting = candidates.find((u) => unitFits(field, u));
  next.unit = unitName(fitting) ?? CANONICAL_UNIT[fieldDimension(field)];
  if (isSideTarget(field)) next.side = current?.side ?? suggestion?.side ?? 'signed-right-positive';
  return next;
}

/**
 * The overrides after setting one column's field. Any other overridden column that held the same
 * field (club and the shot fields are one column each) is set to Ignore, as the server refuses a
 * recipe that maps two columns to one field. Build may come from several columns.
 */
export function setColumnField(
  overrides: ColumnOverrides,
  header: string,
  field: ColumnTarget,
  current: RecipeColumn | null,
  suggestion?: ColumnSuggestion,
): Record<string, RecipeColumn> {
  const out: Record<string, RecipeColumn> = {};
  for (const [h, column] of Object.entries(overrides)) {
    out[h] = h !== header && field !== 'build' && field !== 'ignore' && column.field === field ? { field: 'ignore' } : column;
  }
  out[header] = columnWithField(current, field, suggestion);
  return out;
}

/** The overrides after choosing a unit for one column. */
export function setColumnUnit(overrides: ColumnOverrides, header: string, current: RecipeColumn, unit: string): Record<string, RecipeColumn> {
  if (!unitFits(current.field, unit)) return { ...overrides };
  return { ...overrides, [header]: { ...current, unit } };
}

/** The overrides after choosing a side notation for one column (ignored for a column without a side). */
export function setColumnSide(overrides: ColumnOverrides, header: string, current: RecipeColumn, side: SideNotation): Record<string, RecipeColumn> {
  if (!isSideTarget(current.field)) return { ...overrides };
  const next: RecipeColumn = { ...current, side };
  // L and R letters are the same for both hands
  if (!mayBeHanded(next)) delete next.handed;
  return { ...overrides, [header]: next };
}

/**
 * The overrides after answering a column's sign question: a side notation, or "for the hand" —
 * + is in-to-out or open for this player (signed, + right for a right-hander, turned round for a
 * left-hander).
 */
export function answerSignQuestion(overrides: ColumnOverrides, header: string, current: RecipeColumn, answer: SideNotation | 'for-hand'): Record<string, RecipeColumn> {
  if (answer !== 'for-hand') return setColumnSide(overrides, header, current, answer);
  const signed = setColumnSide(overrides, header, current, 'signed-right-positive');
  return setColumnHanded(signed, header, signed[header] ?? current, true);
}

/** The overrides after saying whose left and right a signed column is written for (ignored where it cannot be). */
export function setColumnHanded(overrides: ColumnOverrides, header: string, current: RecipeColumn, handed: boolean): Record<string, RecipeColumn> {
  if (!mayBeHanded(current)) return { ...overrides };
  const next: RecipeColumn = { ...current };
  if (handed) next.handed = true;
  else delete next.handed;
  return { ...overrides, [header]: next };
}

/**
 * What one column is mapped to right now: the user's override, else the mapping the last preview
 * used, else the automatic suggestion.
 */
export function effectiveColumn(header: string, overrides: ColumnOverrides, used: Recipe | undefined, suggestion: ColumnSuggestion): RecipeColumn {
  const own = overrides[header];
  if (own) return own;
  const fromPreview = used?.columns[header];
  if (fromPreview) return fromPreview;
  const column: RecipeColumn = { field: suggestion.field };
  if (suggestion.unit) column.unit = suggestion.unit;
  if (suggestion.side) column.side = suggestion.side;
  if (suggestion.handed) column.handed = true;
  return column;
}

export type ConfidenceLevel = 'high' | 'medium' | 'low';

/**
 * A suggestion's confidence in three steps for the badge: high from 0.8, low under 0.5.
 * The cut points are a reading choice (common practice, no source).
 */
export function confidenceLevel(confidence: number): ConfidenceLevel {
  if (confidence >= 0.8) return 'high';
  if (confidence >= 0.5) return 'medium';
  return 'low';
}

/** A recipe of only the overridden columns, or undefined when nothing was changed. */
export function recipeFromOverrides(overrides: ColumnOverrides): Recipe | undefined {
  const columns = Object.entries(overrides);
  if (columns.length === 0) return undefined;
  return { columns: Object.fromEntries(columns.map(([h, c]) => [h, { ...c }])) };
}

/**
 * A stored recipe with the fitter's overrides on top (the re-map of a stored file sends the whole
 * mapping). A column of the base that held a field an override now gives to another column is set
 * to Ignore: the server refuses a recipe that maps two columns to one field. Build and Ignore may
 * be held by several columns. Without a base, the overrides alone (or undefined when none).
 * O(columns).
 * @example recipeWithOverrides({ columns: { A: { field: 'carry', unit: 'm' }, B: { field: 'total', unit: 'm' } } }, { B: { field: 'carry', unit: 'm' } })
 * // => { columns: { A: { field: 'ignore' }, B: { field: 'carry', unit: 'm' } } }
 */
export function recipeWithOverrides(base: Recipe | undefined, overrides: ColumnOverrides): Recipe | undefined {
  if (!base) return recipeFromOverrides(overrides);
  const claimed = new Set<ColumnTarget>();
  for (const c of Object.values(overrides)) if (c.field !== 'build' && c.field !== 'ignore') claimed.add(c.field);
  const columns: Record<string, RecipeColumn> = {};
  for (const [header, column] of Object.entries(base.columns)) {
    const own = overrides[header];
    columns[header] = own ? { ...own } : claimed.has(column.field) ? { field: 'ignore' } : { ...column };
  }
  for (const [header, column] of Object.entries(overrides)) if (!(header in columns)) columns[header] = { ...column };
  return { ...base, columns };
}
