import { useCallback, useMemo, useRef, useState } from 'react';
import type { ColumnSuggestion, ColumnTarget, Recipe, RecipeColumn, SideNotation } from '@/analysis/import';
import type { ImportOptions } from '@/server/schemas';
import { useBayFilePreviewQuery, type BayFilePreview } from '../queries/bay-files';
import { useDebouncedValue } from '../use-debounced-value';
import { buildAssignmentFor, INITIAL_BUILD_CHOICE, type BuildChoice } from './build-choice';
import { effectiveColumn, recipeWithOverrides, answerSignQuestion, setColumnField, setColumnHanded, setColumnSide, setColumnUnit } from './recipe-edit';
import { openSignQuestions } from './sign-questions';
import type { UploadFile } from './upload-request';

/** Wait after the last edit before the preview runs again. */
const PREVIEW_DEBOUNCE_MS = 400;

type MappingSource = {
  fittingId: string;
  /** The file to preview: a picked one, or a stored one's text; null: idle. */
  file: UploadFile | null;
  /** The mapping the edits go on top of (a stored file's recipe); none: the automatic suggestion. */
  base?: Recipe;
  /** A saved recipe of the shop the server puts under the edits. */
  recipeId?: string | null;
  initialBuilds?: BuildChoice;
  /** Stop previewing (after the file was stored). */
  paused: boolean;
};

/**
 * The mapping step of one file, shared by the import and the re-map of a stored file: the
 * fitter's column overrides, the builds, the options they make, and the preview that follows
 * every edit (debounced), with the last good preview kept on screen when an edit is refused.
 */
export function useMappingSession({ fittingId, file, base, recipeId, initialBuilds = INITIAL_BUILD_CHOICE, paused }: MappingSource) {
  const [overrides, setOverrides] = useState<Record<string, RecipeColumn>>({});
  const [builds, setBuilds] = useState<BuildChoice>(initialBuilds);

  const assignment = buildAssignmentFor(builds);
  // The options as JSON text: a stable value for memo and debounce while nothing changes.
  const optionsJson = assignment
    ? JSON.stringify({ recipe: recipeWithOverrides(base, overrides), recipeId: recipeId ?? undefined, builds: assignment })
    : null;
  const options = useMemo<ImportOptions | null>(() => (optionsJson ? (JSON.parse(optionsJson) as ImportOptions) : null), [optionsJson]);
  const settledOptions = useDebouncedValue(options, PREVIEW_DEBOUNCE_MS);
  const preview = useBayFilePreviewQuery(fittingId, paused ? null : file, settledOptions);
  const lastGood = useRef<{ file: UploadFile; data: BayFilePreview } | null>(null);
  if (preview.data && file && !preview.isPlaceholderData) lastGood.current = { file, data: preview.data };
  const shown = preview.data ?? (lastGood.current && lastGood.current.file === file ? lastGood.current.data : undefined);

  const setField = useCallback((header: string, field: ColumnTarget, current: RecipeColumn, suggestion: ColumnSuggestion) => {
    setOverrides((o) => setColumnField(o, header, field, current, suggestion));
  }, []);
  const setUnit = useCallback((header: string, current: RecipeColumn, unit: string) => {
    setOverrides((o) => setColumnUnit(o, header, current, unit));
  }, []);
  const setSide = useCallback((header: string, current: RecipeColumn, side: SideNotation) => {
    setOverrides((o) => setColumnSide(o, header, current, side));
  }, []);
  const setHanded = useCallback((header: string, current: RecipeColumn, handed: boolean) => {
    setOverrides((o) => setColumnHanded(o, header, current, handed));
  }, []);
  const answerSign = useCallback((header: string, current: RecipeColumn, answer: SideNotation | 'for-hand') => {
    setOverrides((o) => answerSignQuestion(o, header, current, answer));
  }, []);
  const resetMapping = useCallback(() => setOverrides({}), []);
  const signQuestions = shown
    ? openSignQuestions({
        ambiguous: shown.ambiguous,
        fieldOf: (header) => {
          const suggestion = shown.suggestions.find((s) => s.header === header);
          return suggestion ? effectiveColumn(header, overrides, shown.recipe, suggestion).field : 'ignore';
        },
        overrides,
        base,
        fromRecipe: Boolean(recipeId),
      })
    : [];

  return {
    overrides,
    setField,
    setUnit,
    setSide,
    setHanded,
    answerSign,
    resetMapping,
    builds,
    setBuilds,
    buildsComplete: assignment !== null,
    /** The options the choices on screen make (null while a build lacks its name). */
    options,
    preview,
    /** The preview to show: the current one, or the last good one of this file. */
    shown,
    /** Left/right columns whose sign the fitter has still to answer (headers). */
    signQuestions,
    /** Whether the preview on screen is for older choices than those on screen. */
    previewBehind: options !== settledOptions || preview.isPlaceholderData || preview.isFetching,
  };
}

export type MappingSession = ReturnType<typeof useMappingSession>;
