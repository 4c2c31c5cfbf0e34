/**
 * The automatic suggestion with a recipe on top: the recipe's columns win, a field it gives to one
 * column is taken from any other, and a unit it leaves out comes from the header (or is assumed,
 * with a warning).
 */
import { SIDE_FIELDS, type ShotField } from '@/analysis/fields';
import { CANONICAL_UNIT, fieldDimension, findUnit, type UnitInfo } from '@/analysis/units';
import { ImportError, type ImportErrorCode } from './import-error';
import { recipeSchema, type ColumnTarget, type Recipe, type RecipeColumn, type SideNotation } from './recipe';
import type { ColumnSuggestion } from './suggest-mapping';
import type { ImportWarning } from './unit-plausibility';

/** One column of the file as the import will read it. */
export interface MergedColumn {
  header: string;
  index: number;
  field: ColumnTarget;
  unit: string | null;
  side: SideNotation | null;
  /** Signed values written for the player's hand (recipe.ts, `handed`). */
  handed: boolean;
}

export function isShotField(target: ColumnTarget): target is ShotField {
  return target !== 'club' && target !== 'build' && target !== 'ignore';
}

/**
 * The first problem of a recipe as an ImportError (its code from the schema, else BAD_RECIPE), or
 * null when the recipe is valid. O(columns).
 */
export function recipeError(recipe: unknown): ImportError | null {
  const parsed = recipeSchema.safeParse(recipe);
  if (parsed.success) return null;
  const issue = parsed.error.issues[0];
  const params = (issue as { params?: { importCode?: ImportErrorCode } }).params;
  const column = issue.path[0] === 'columns' && typeof issue.path[1] === 'string' ? issue.path[1] : undefined;
  const where = issue.path.length ? ` at ${issue.path.join('.')}` : '';
  return new ImportError(params?.importCode ?? 'BAD_RECIPE', `The recipe is not valid${where}: ${issue.message}`, column);
}

/**
 * The suggestion with the recipe's columns on top. Pushes RECIPE_COLUMN_MISSING, UNIT_ASSUMED
 * and RECIPE_OVERRIDE warnings. O(columns).
 * @throws ImportError BAD_RECIPE when the recipe maps two columns to one field
 * @example mergeRecipe(suggestions, units, { columns: { 'Carry': { field: 'carry', unit: 'yd' } } }, [])
 */
export function mergeRecipe(
  suggestions: readonly ColumnSuggestion[],
  statedUnits: readonly (UnitInfo | null)[],
  recipe: Recipe | undefined,
  warnings: ImportWarning[],
): MergedColumn[] {
  const merged: MergedColumn[] = suggestions.map((s) => ({ header: s.header, index: s.index, field: s.field, unit: s.unit, side: s.side, handed: false }));
  if (!recipe) return merged;
  const byHeader = new Map(merged.map((m) => [m.header, m]));
  const claimed = new Map<ColumnTarget, string>();
  for (const [header, column] of Object.entries(recipe.columns) as [string, RecipeColumn][]) {
    const target = byHeader.get(header) ?? byHeader.get(header.trim());
    if (!target) {
      warnings.push({ code: 'RECIPE_COLUMN_MISSING', column: header, message: `The recipe names a column "${header}" that this file does not have; it was ignored.` });
      continue;
    }
    if (column.field !== 'build' && column.field !== 'ignore') {
      const other = claimed.get(column.field);
      if (other !== undefined) {
        throw new ImportError('BAD_RECIPE', `The recipe maps both "${other}" and "${header}" to ${column.field}.`, header);
      }
      claimed.set(column.field, header);
    }
    const sameField = target.field === column.field;
    let unit: string | null = null;
    if (isShotField(column.field)) {
      if (column.unit !== undefined) unit = column.unit;
      else if (sameField && target.unit !== null) unit = target.unit;
      else {
        const stated = (target.unit !== null ? findUnit(target.unit) : null) ?? statedUnits[target.index];
        const dimension = fieldDimension(column.field);
        unit = stated && stated.dimension === dimension ? stated.unit : null;
        if (unit === null) {
          unit = CANONICAL_UNIT[dimension];
          warnings.push({ code: 'UNIT_ASSUMED', column: header, message: `${header}: the recipe gives no unit for ${column.field}; ${unit} assumed.` });
        }
      }
    }
    let side: SideNotation | null = null;
    if (isShotField(column.field) && SIDE_FIELDS.has(column.field)) {
      side = column.side ?? (sameField && target.side !== null ? target.side : 'signed-right-positive');
    }
    target.field = column.field;
    target.unit = unit;
    target.side = side;
    target.handed = column.handed === true && isShotField(column.field);
  }
  // a field the recipe gave to one column is taken from any other column the suggestion gave it to
  for (const m of merged) {
    const owner = claimed.get(m.field);
    if (owner !== undefined && owner !== m.header) {
      warnings.push({ code: 'RECIPE_OVERRIDE', column: m.header, message: `${m.header} was suggested as ${m.field}, but the recipe gives ${m.field} to "${owner}"; ignored.` });
      m.field = 'ignore';
      m.unit = null;
      m.side = null;
      m.handed = false;
    }
  }
  return merged;
}
