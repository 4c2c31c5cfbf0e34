/**
 * A saved recipe in words for its owner's page: how the file is split and, per column, what it
 * is read as (field, unit, left/right notation), ignored columns last.
 */
import type { Recipe } from '@/analysis/import';
import { SIDE_LABELS, TARGET_LABELS, unitName } from '../import/recipe-edit';

export type RecipeColumnLine = { header: string; reading: string; ignored: boolean };

const DELIMITERS = { ',': 'Commas', ';': 'Semicolons', '\t': 'Tabs' } as const;

/** The columns the recipe keeps (not ignored). O(columns). */
export function keptColumnCount(recipe: Recipe): number {
  let n = 0;
  for (const c of Object.values(recipe.columns)) if (c.field !== 'ignore') n++;
  return n;
}

/**
 * One line per column: "Carry, in yd", "Offline, in m, + is right", "Ignored"; kept columns in
 * file order, then the ignored ones. O(columns).
 * @example recipeColumnLines({ columns: { 'Carry (yds)': { field: 'carry', unit: 'yds' } } })[0].reading // => 'Carry, in yd'
 */
export function recipeColumnLines(recipe: Recipe): RecipeColumnLine[] {
  const lines = Object.entries(recipe.columns).map(([header, c]) => {
    if (c.field === 'ignore') return { header, reading: 'Ignored', ignored: true };
    const parts: string[] = [TARGET_LABELS[c.field]];
    const unit = unitName(c.unit) ?? c.unit;
    if (unit) parts.push(`in ${unit}`);
    if (c.side) parts.push(SIDE_LABELS[c.side]);
    return { header, reading: parts.join(', '), ignored: false };
  });
  return [...lines.filter((l) => !l.ignored), ...lines.filter((l) => l.ignored)];
}

/** What a setting the recipe leaves open says: the import reads it from each file. */
const FROM_FILE = 'As each file shows';

/** How the recipe splits a file: cells, decimal mark, header line. */
export function recipeFileSettings(recipe: Recipe): { label: string; value: string }[] {
  return [
    { label: 'Cells split at', value: recipe.delimiter ? DELIMITERS[recipe.delimiter] : FROM_FILE },
    { label: 'Decimal mark', value: recipe.decimal ? (recipe.decimal === ',' ? 'Comma' : 'Point') : FROM_FILE },
    { label: 'Header on line', value: recipe.headerRow === undefined ? FROM_FILE : String(recipe.headerRow + 1) },
  ];
}
