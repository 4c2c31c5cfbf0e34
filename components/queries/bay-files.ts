import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Shot } from '@/analysis/fields';
import type { ColumnSuggestion, Recipe, SniffResult } from '@/analysis/import';
import type { BayFile, ImportOptions, ImportReport } from '@/server/schemas';
import { apiRequest, api } from '../api-client';
import { uploadBayFile, type UploadFile, type UploadProgress } from '../import/upload-request';
import { fittingKeys } from './fittings';
import { recipeKeys } from './recipes';

/** What POST …/bay-files/preview answers: the mapping used, the report and the first shots. */
export type BayFilePreview = {
  fileName: string;
  contentHash: string;
  duplicateOf: { id: string; fileName: string } | null;
  sniff: SniffResult;
  recipe: Recipe;
  suggestions: ColumnSuggestion[];
  report: ImportReport;
  /** The first 25 shots, canonical units. */
  shots: Shot[];
};

/** A picked file's identity for query keys (the File itself is not serialisable). */
export const fileKeyOf = (file: UploadFile & { lastModified?: number }) => `${file.name}\u0000${file.size}\u0000${file.lastModified ?? 0}`;

// Under the fittings root: a commit changes a fitting's shot count, its bay files and its
// analysis together, and one invalidation of ['fittings'] refreshes them all.
export const bayFileKeys = {
  all: [...fittingKeys.all, 'bay-files'] as const,
  list: (fittingId: string) => [...bayFileKeys.all, fittingId] as const,
};

// Previews are not under ['fittings']: a commit must not re-run the preview of the file it stored.
export const bayFilePreviewKeys = {
  all: ['bay-file-previews'] as const,
  preview: (fittingId: string, fileKey: string, options: ImportOptions) => [...bayFilePreviewKeys.all, fittingId, fileKey, options] as const,
};

const fittingPath = (fittingId: string) => `/fittings/${encodeURIComponent(fittingId)}/bay-files`;

export const getBayFiles = (fittingId: string) => api.get<BayFile[]>(fittingPath(fittingId));

export const previewBayFile = (fittingId: string, file: UploadFile, options: ImportOptions, signal?: AbortSignal) =>
  uploadBayFile<BayFilePreview>(`${fittingPath(fittingId)}/preview`, file, options, undefined, signal);

export const bayFilesQuery = (fittingId: string) =>
  queryOptions({ queryKey: bayFileKeys.list(fittingId), queryFn: () => getBayFiles(fittingId) });

export function useBayFilesQuery(fittingId: string) {
  return useQuery(bayFilesQuery(fittingId));
}

/**
 * The preview of a picked file with the given options; re-runs when they change, keeping the last
 * answer on screen meanwhile. `file` null: idle.
 */
export function useBayFilePreviewQuery(fittingId: string, file: UploadFile | null, options: ImportOptions | null) {
  return useQuery({
    queryKey: bayFilePreviewKeys.preview(fittingId, file ? fileKeyOf(file) : '', options ?? {}),
    queryFn: ({ signal }) => previewBayFile(fittingId, file!, options ?? {}, signal),
    enabled: file !== null && options !== null,
    // The same file with the same options gives the same preview while the page is open.
    staleTime: Infinity,
    gcTime: 60_000,
    // A 4xx (bad recipe, not a CSV) will not change on a retry; the page shows it at once.
    retry: false,
    placeholderData: keepPreviousData,
  });
}

/** Stores the file with its options; reports upload progress (0..1, null when unknown). */
export function useCommitBayFileMutation(fittingId: string, onProgress?: UploadProgress) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, options }: { file: UploadFile; options: ImportOptions }) =>
      uploadBayFile<BayFile>(fittingPath(fittingId), file, options, onProgress),
    // The fitting's shot count, its bay files, its analysis; a saved recipe joins the list.
    onSuccess: (_file, { options }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: fittingKeys.all }),
        options.saveRecipeAs ? queryClient.invalidateQueries({ queryKey: recipeKeys.all }) : null,
      ]),
  });
}

export function useDeleteBayFileMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (bayFileId: string) => apiRequest<void>('DELETE', `/bay-files/${encodeURIComponent(bayFileId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fittingKeys.all }),
  });
}
