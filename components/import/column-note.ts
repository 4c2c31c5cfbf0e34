/**
 * What the mapping step says under one column: why it is read the way it is (the automatic
 * suggestion, the fitter's edit, a recipe or the stored mapping, or another column taking its
 * field), and the badge shown in place of the suggestion's confidence.
 */
import type { ColumnSuggestion, Recipe, RecipeColumn } from '@/analysis/import';
import { TARGET_LABELS } from './recipe-edit';

export type ColumnNote = {
  /** Shown instead of the confidence badge; undefined: the confidence shows. */
  badge?: string;
  text: string;
  /** The column needs a look (a low-confidence guess nobody has confirmed, an open question). */
  attention: boolean;
  /** Its left/right sign is a question for the fitter (answered on the row). */
  question?: boolean;
};

type ColumnNoteInput = {
  column: RecipeColumn;
  suggestion: ColumnSuggestion;
  /** The fitter changed this column on this page. */
  changed: boolean;
  /** The stored mapping the page started from (a re-map), if any. */
  base?: Recipe;
  /** A saved recipe was chosen (an import). */
  fromRecipe: boolean;
  /** The suggestion's confidence is low. */
  low: boolean;
  /** The file does not say which way + points in this left/right column, and nobody has answered yet. */
  signQuestion?: boolean;
};

/**
 * The note for a column, in this order: the fitter's edit; an open question about its sign; the
 * suggestion, when the column is read as suggested; the stored mapping, when it holds this reading;
 * a chosen recipe; Ignore while another column holds the suggested field; else a plain "read as".
 * @example columnNote({ column: { field: 'ignore' }, suggestion, changed: true, fromRecipe: false, low: false }).badge // => 'Your choice'
 */
export function columnNote({ column, suggestion, changed, base, fromRecipe, low, signQuestion = false }: ColumnNoteInput): ColumnNote {
  const now = TARGET_LABELS[column.field];
  const suggested = `Suggested: ${TARGET_LABELS[suggestion.field]} (${suggestion.reason})`;
  if (changed) return { badge: 'Your choice', text: `Set by you to ${now}. ${suggested}`, attention: false };
  if (signQuestion) {
    return { badge: 'Question', text: `Read as ${now} (${suggestion.reason}). The file does not say which way + points: answer below.`, attention: true, question: true };
  }
  if (column.field === suggestion.field) return { text: suggestion.reason, attention: low };
  if (base && base.columns[suggestion.header]?.field === column.field) return { badge: 'As stored', text: `As stored: ${now}. ${suggested}`, attention: false };
  if (fromRecipe) return { badge: 'Recipe', text: `From the recipe: ${now}. ${suggested}`, attention: false };
  if (column.field === 'ignore') {
    return { text: `Ignored: another column now holds ${TARGET_LABELS[suggestion.field]}. ${suggested}`, attention: false };
  }
  return { text: `Read as ${now}. ${suggested}`, attention: false };
}
