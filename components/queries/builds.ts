import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Build } from '@/server/schemas';
import { api } from '../api-client';
import type { BuildSpec } from '../builds/build-summary';
import { fittingKeys } from './fittings';

// Under the fittings root: a commit or re-map of a bay file makes new groups (and so new builds),
// and the invalidation of ['fittings'] those mutations do refreshes this list too.
export const buildKeys = {
  all: [...fittingKeys.all, 'builds'] as const,
  list: (fittingId: string) => [...buildKeys.all, 'list', fittingId] as const,
  detail: (id: string) => [...buildKeys.all, 'detail', id] as const,
};

/** A change to a build's specs: only the keys sent change; null clears one. */
export type BuildChange = Partial<BuildSpec>;

export const getBuilds = (fittingId: string) => api.get<Build[]>(`/fittings/${encodeURIComponent(fittingId)}/builds`);
export const getBuild = (id: string) => api.get<Build>(`/builds/${encodeURIComponent(id)}`);
export const updateBuild = (id: string, change: BuildChange) => api.patch<Build>(`/builds/${encodeURIComponent(id)}`, change);

export const buildsQuery = (fittingId: string) =>
  queryOptions({ queryKey: buildKeys.list(fittingId), queryFn: () => getBuilds(fittingId) });

/** Every build of a fitting (one per club × build group of its shots). */
export function useBuildsQuery(fittingId: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...buildsQuery(fittingId), enabled: options.enabled ?? true });
}

export const buildQuery = (id: string) => queryOptions({ queryKey: buildKeys.detail(id), queryFn: () => getBuild(id) });

/** One build by its id (GET /api/builds/:id): its edit page needs nothing else from its address. */
export function useBuildQuery(id: string) {
  return useQuery(buildQuery(id));
}

/** Saves a build's specs (staff only). */
export function useUpdateBuildMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: BuildChange }) => updateBuild(id, change),
    onSuccess: (build) => {
      queryClient.setQueryData(buildKeys.detail(build.id), build);
      queryClient.setQueryData<Build[]>(buildKeys.list(build.fittingId), (list) => list?.map((b) => (b.id === build.id ? build : b)));
      // Broadly: the analysis's ladder reads the lofts (loft steps appear once they are set).
      return queryClient.invalidateQueries({ queryKey: fittingKeys.all });
    },
  });
}
