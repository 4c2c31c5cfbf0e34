import { useCallback, useState } from 'react';
import type { BayFile } from '@/server/schemas';
import { useCommitBayFileMutation } from '../queries/bay-files';
import type { UploadFile } from './upload-request';
import { useMappingSession } from './use-mapping-session';

/** Upload phases of a commit: bytes going up (with a fraction), then the server reading the file. */
export type CommitPhase = { kind: 'idle' } | { kind: 'uploading'; fraction: number | null } | { kind: 'processing' };

/**
 * One import of one file into a fitting: the picked file (kept in memory), the saved recipe
 * chosen, the mapping step (use-mapping-session), and the commit with its progress.
 */
export function useImportSession(fittingId: string) {
  const [file, setFileState] = useState<UploadFile | null>(null);
  const [recipeId, setRecipeIdState] = useState<string | null>(null);
  const [saveRecipeAs, setSaveRecipeAs] = useState('');
  const [phase, setPhase] = useState<CommitPhase>({ kind: 'idle' });
  const [committed, setCommitted] = useState<BayFile | null>(null);
  const mapping = useMappingSession({ fittingId, file, recipeId, paused: committed !== null });
  const { resetMapping, options } = mapping;

  const commit = useCommitBayFileMutation(fittingId, (fraction) =>
    setPhase(fraction !== null && fraction >= 1 ? { kind: 'processing' } : { kind: 'uploading', fraction }),
  );

  const setFile = useCallback(
    (next: UploadFile | null) => {
      setFileState(next);
      resetMapping();
      // After a stored import the next file starts afresh: saving under the same name again
      // would overwrite that recipe with the next file's mapping.
      if (committed) setSaveRecipeAs('');
      setCommitted(null);
      setPhase({ kind: 'idle' });
      commit.reset();
    },
    [commit.reset, resetMapping, committed],
  );

  const setRecipeId = useCallback(
    (id: string | null) => {
      // A saved recipe replaces the fitter's edits so far; edits after it go on top of it.
      setRecipeIdState(id);
      resetMapping();
    },
    [resetMapping],
  );

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
    ...mapping,
    file,
    setFile,
    recipeId,
    setRecipeId,
    saveRecipeAs,
    setSaveRecipeAs,
    commit: { start, phase, error: commit.error, busy: commit.isPending },
    committed,
  };
}

export type ImportSession = ReturnType<typeof useImportSession>;
