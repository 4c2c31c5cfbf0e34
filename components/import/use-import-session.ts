import { useCallback, useMemo, useRef, useState } from 'react';
import type { ColumnSuggestion, ColumnTarget, RecipeColumn, SideNotation } from '@/analysis/import';
import type { BayFile, ImportOptions } from '@/server/schemas';
import { useBayFilePreviewQuery, useCommitBayFileMutation, type BayFilePreview } from '../queries/bay-files';
import { useDebouncedValue } from '../use-debounced-value';
import { buildAssignmentFor, INITIAL_BUILD_CHOICE, type BuildChoice } from './build-choice';
import { recipeFromOverrides, setColumnField, setColumnSide, setColumnUnit } from './recipe-edit';
import type { UploadFile } from './upload-request';

/** Upload phases of a commit: bytes going up (with a fraction), then the server reading the file. */
export type CommitPhase = { kind: 'idle' } | { kind: 'uploading'; fraction: number | null } | { kind: 'processing' };

/** Wait after the last edit before the preview runs again. */
const PREVIEW_DEBOUNCE_MS = 400;

/**
 * One import of one file into a fitting: the picked file (kept in memory), the fitter's column
 * overrides, the saved recipe chosen, the builds, the preview that follows every edit, and the
 * commit with its progress.
 */
export function useImportSession(fittingId: string) {
  const [file, setFileState] = useState<UploadFile | null>(null);
  const [overrides, setOverrides] = useState<Record<string, RecipeColumn>>({});
  const [recipeId, setRecipeIdState] = useState<string | null>(null);
  const [builds, setBuilds] = useState<BuildChoice>(INITIAL_BUILD_CHOICE);
  const [saveRecipeAs, setSaveRecipeAs] = useState('');
  const [phase, setPhase] = useState<CommitPhase>({ kind: 'idle' });
  const [committed, setCommitted] = useState<BayFile | null>(null);

  const assignment = buildAssignmentFor(builds);
  // The options as JSON text: a stable value for memo and debounce while nothing changes.
  const optionsJson = assignment
    ? JSON.stringify({ recipe: recipeFromOverrides(overrides), recipeId: recipeId ?? undefined, builds: assignment })
    : null;
  const options = useMemo<ImportOptions | null>(() => (optionsJson ? (JSON.parse(optionsJson) as ImportOptions) : null), [optionsJson]);
  const settledOptions = useDebouncedValue(options, PREVIEW_DEBOUNCE_MS);
  const preview = useBayFilePreviewQuery(fittingId, committed ? null : file, settledOptions);
  // The last good preview stays on screen when an edit makes the server refuse the mapping,
  // so the fitter can undo that edit.
  const lastGood = useRef<{ file: UploadFile; data: BayFilePreview } | null>(null);
  if (preview.data && file && !preview.isPlaceholderData) lastGood.current = { file, data: preview.data };
  const shown = preview.data ?? (lastGood.current && lastGood.current.file === file ? lastGood.current.data : undefined);

  const commit = useCommitBayFileMutation(fittingId, (fraction) =>
    setPhase(fraction !== null && fraction >= 1 ? { kind: 'processing' } : { kind: 'uploading', fraction }),
  );

  const setFile = useCallback((next: UploadFile | null) => {
    setFileState(next);
    setOverrides({});
    setCommitted(null);
    setPhase({ kind: 'idle' });
    commit.reset();
  }, [commit.reset]);

  const setRecipeId = useCallback((id: string | null) => {
    // A saved recipe replaces the fitter's edits so far; edits after it go on top of it.
    setRecipeIdState(id);
    setOverrides({});
  }, []);

  const setField = useCallback((header: string, field: ColumnTarget, current: RecipeColumn, suggestion: ColumnSuggestion) => {
    setOverrides((o) => setColumnField(o, header, field, current, suggestion));
  }, []);
  const setUnit = useCallback((header: string, current: RecipeColumn, unit: string) => {
    setOverrides((o) => setColumnUnit(o, header, current, unit));
  }, []);
  const setSide = useCallback((header: string, current: RecipeColumn, side: SideNotation) => {
    setOverrides((o) => setColumnSide(o, header, current, side));
  }, []);

  const start = () => {
    if (!file || !options) return;
    const name = saveRecipeAs.trim();
    setPhase({ kind: 'uploading', fraction: 0 });
    commit.mutate(
      { file, options: { ...options, ...(name ? { saveRecipeAs: name } : {}) } },
      {
        onSuccess: (bayFile) => setCommitted(bayFile),
        onSettled: () => setPhase({ kind: 'idle' }),
      },
    );
  };

  return {
    file,
    setFile,
    overrides,
    setField,
    setUnit,
    setSide,
    resetMapping: () => setOverrides({}),
    recipeId,
    setRecipeId,
    builds,
    setBuilds,
    buildsComplete: assignment !== null,
    saveRecipeAs,
    setSaveRecipeAs,
    preview,
    /** The preview to show: the current one, or the last good one of this file. */
    shown,
    /** Whether the preview on screen is for older choices than those on screen. */
    previewBehind: options !== settledOptions || preview.isPlaceholderData || preview.isFetching,
    commit: { start, phase, error: commit.error, busy: commit.isPending },
    committed,
  };
}

export type ImportSession = ReturnType<typeof useImportSession>;
