import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Shot } from '@/analysis/fields';
import type { AmbiguousColumn, ColumnSuggestion, Recipe, SniffResult } from '@/analysis/import';
import type { BayFile, BuildAssignment, ImportOptions, ImportReport } from '@/server/schemas';
import { apiRequest, api } from '../api-client';
import { downloadText } from '../import/text-request';
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
  /** The suggestion's guesses to confirm (kind 'sign': a left/right column whose sign the file does not state). */
  ambiguous: AmbiguousColumn[];
  report: ImportReport;
  /** The first 25 shots, canonical units. */
  shots: Shot[];
  /** The player's hand: a left-hander's signed columns may be written for it (recipe `handed`). */
  hand: 'right' | 'left';
};

/** A picked file's identity for query keys (the File itself is not serialisable). */
export const fileKeyOf = (file: UploadFile & { lastModified?: number }) => `${file.name}\u0000${file.size}\u0000${file.lastModified ?? 0}`;

// Under the fittings root: a commit changes a fitting's shot count, its bay files and its
// analysis together, and one invalidation of ['fittings'] refreshes them all.
export const bayFileKeys = {
  all: [...fittingKeys.all, 'bay-files'] as const,
  list: (fittingId: string) => [...bayFileKeys.all, 'list', fittingId] as const,
  detail: (id: string) => [...bayFileKeys.all, 'detail', id] as const,
};

// The stored text never changes (a re-map keeps it), so it is not under ['fittings'] either.
export const bayFileTextKeys = {
  all: ['bay-file-texts'] as const,
  text: (id: string) => [...bayFileTextKeys.all, id] as const,
};

// Previews are not under ['fittings']: a commit must not re-run the preview of the file it stored.
export const bayFilePreviewKeys = {
  all: ['bay-file-previews'] as const,
  preview: (fittingId: string, fileKey: string, options: ImportOptions) => [...bayFilePreviewKeys.all, fittingId, fileKey, options] as const,
};

const fittingPath = (fittingId: string) => `/fittings/${encodeURIComponent(fittingId)}/bay-files`;
const filePath = (id: string) => `/bay-files/${encodeURIComponent(id)}`;

/** What PUT /api/bay-files/:id/recipe takes: the whole mapping, and how builds are given. */
export type RemapBody = { recipe: Recipe; builds: BuildAssignment };

export const getBayFiles = (fittingId: string) => api.get<BayFile[]>(fittingPath(fittingId));
export const getBayFile = (id: string) => api.get<BayFile>(filePath(id));
export const getBayFileText = (id: string, signal?: AbortSignal) => downloadText(`${filePath(id)}/raw`, signal);
export const remapBayFile = (id: string, body: RemapBody) => apiRequest<BayFile>('PUT', `${filePath(id)}/recipe`, { body });

export const previewBayFile = (fittingId: string, file: UploadFile, options: ImportOptions, signal?: AbortSignal) =>
  uploadBayFile<BayFilePreview>(`${fittingPath(fittingId)}/preview`, file, options, undefined, signal);

export const bayFilesQuery = (fittingId: string) =>
  queryOptions({ queryKey: bayFileKeys.list(fittingId), queryFn: () => getBayFiles(fittingId) });

export function useBayFilesQuery(fittingId: string) {
  return useQuery(bayFilesQuery(fittingId));
}

export const bayFileQuery = (id: string) => queryOptions({ queryKey: bayFileKeys.detail(id), queryFn: () => getBayFile(id) });

export function useBayFileQuery(id: string) {
  return useQuery(bayFileQuery(id));
}

/** The stored text of a bay file (for its re-map); fetched once while the page is open. */
export function useBayFileTextQuery(id: string) {
  return useQuery({
    queryKey: bayFileTextKeys.text(id),
    queryFn: ({ signal }) => getBayFileText(id, signal),
    // The stored text is never changed; only a delete ends it.
    staleTime: Infinity,
    gcTime: 60_000,
  });
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

/**
 * Applies a new mapping to a stored file: its shots are replaced on the server, so the fitting's
 * shot count, bay files and analysis refresh (all under ['fittings']).
 */
export function useRemapBayFileMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RemapBody) => remapBayFile(id, body),
    onSuccess: (bayFile) => {
      queryClient.setQueryData(bayFileKeys.detail(id), bayFile);
      return queryClient.invalidateQueries({ queryKey: fittingKeys.all });
    },
  });
}

/** Deletes a bay file with its shots (staff only); the fitting's counts and analysis refresh. */
export function useDeleteBayFileMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (bayFileId: string) => apiRequest<void>('DELETE', filePath(bayFileId)),
    onSuccess: (_nothing, bayFileId) => {
      // Gone for good: drop what was cached of it rather than refetch a 404.
      queryClient.removeQueries({ queryKey: bayFileKeys.detail(bayFileId) });
      queryClient.removeQueries({ queryKey: bayFileTextKeys.text(bayFileId) });
      return queryClient.invalidateQueries({ queryKey: fittingKeys.all });
    },
  });
}
