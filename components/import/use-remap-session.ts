import { useMemo, useState } from 'react';
import type { BayFile } from '@/server/schemas';
import { useBayFileTextQuery, useRemapBayFileMutation } from '../queries/bay-files';
import { buildAssignmentFor, buildChoiceOfStored } from './build-choice';
import { recipeWithOverrides } from './recipe-edit';
import { storedUploadFile } from './text-request';
import { useMappingSession } from './use-mapping-session';

/**
 * A new mapping for a stored bay file: its stored text runs through the same preview as a picked
 * file, starting from the file's stored recipe and builds; applying it replaces the file's shots.
 */
export function useRemapSession(bayFile: BayFile) {
  const text = useBayFileTextQuery(bayFile.id);
  const file = useMemo(() => (text.data === undefined ? null : storedUploadFile(text.data, bayFile.fileName)), [text.data, bayFile.fileName]);
  // The file as it was before this page changed it, for the result's comparison.
  const [before, setBefore] = useState(bayFile);
  const [applied, setApplied] = useState<BayFile | null>(null);
  const initialBuilds = useMemo(() => buildChoiceOfStored(bayFile.recipe, bayFile.report.groups), [bayFile.recipe, bayFile.report.groups]);
  const mapping = useMappingSession({
    fittingId: bayFile.fittingId,
    file,
    base: bayFile.recipe,
    initialBuilds,
    paused: applied !== null,
  });
  const remap = useRemapBayFileMutation(bayFile.id);
  const { overrides, builds, resetMapping } = mapping;

  const apply = () => {
    // The same mapping the preview on screen was made with (use-mapping-session's options).
    const recipe = recipeWithOverrides(bayFile.recipe, overrides);
    const assignment = buildAssignmentFor(builds);
    if (!recipe || !assignment) return;
    remap.mutate({ recipe, builds: assignment }, { onSuccess: setApplied });
  };

  /** Back to the mapping step, now starting from the mapping just applied. */
  const again = () => {
    if (applied) setBefore(applied);
    setApplied(null);
    resetMapping();
    remap.reset();
  };

  return { ...mapping, text, before, applied, apply, again, busy: remap.isPending, error: remap.error };
}

export type RemapSession = ReturnType<typeof useRemapSession>;
