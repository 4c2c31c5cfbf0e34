/**
 * Left/right columns whose sign convention the file does not state: the automatic mapping
 * assumes "+ is right", but a wrong guess mirrors every shot, so the fitter is asked. A question
 * is open until the fitter answers it on the page (or the mapping comes from a stored file or a
 * saved recipe, where it was answered before).
 */
import type { AmbiguousColumn, ColumnTarget, Recipe } from '@/analysis/import';
import type { ColumnOverrides } from './recipe-edit';
import { isSideTarget } from './recipe-edit';

type SignQuestionInput = {
  ambiguous: readonly AmbiguousColumn[] | undefined;
  /** The column as read now, by header. */
  fieldOf: (header: string) => ColumnTarget;
  overrides: ColumnOverrides;
  /** The stored mapping of a re-map. */
  base?: Recipe;
  /** A saved recipe was chosen. */
  fromRecipe: boolean;
};

/**
 * The headers whose sign is still a question, in file order. O(columns).
 * @example openSignQuestions({ ambiguous: [{ column: 'Side', kind: 'sign', field: 'offline', reason: '…' }], fieldOf: () => 'offline', overrides: {}, fromRecipe: false }) // => ['Side']
 */
export function openSignQuestions({ ambiguous, fieldOf, overrides, base, fromRecipe }: SignQuestionInput): string[] {
  if (base || fromRecipe || !ambiguous) return [];
  return ambiguous
    .filter((a) => a.kind === 'sign' && !(a.column in overrides) && isSideTarget(fieldOf(a.column)))
    .map((a) => a.column);
}

/**
 * The suggestion's reason without the assumption the question replaces ("…; signed values, sign
 * convention not stated; + is right assumed" → "…"): the page asks instead of assuming.
 */
export function reasonWithoutSignGuess(reason: string, ambiguous: readonly AmbiguousColumn[] | undefined, header: string): string {
  const guess = ambiguous?.find((a) => a.kind === 'sign' && a.column === header)?.reason;
  if (!guess) return reason;
  if (reason === guess) return '';
  return reason.replace(`; ${guess}`, '').replace(`${guess}; `, '');
}
