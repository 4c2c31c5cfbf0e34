import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ChosenBuildsBody, ChosenBuildsView, ConfirmChosenBuildsBody } from '@/server/schemas';
import { api, apiRequest } from '../api-client';
import { bagKeys } from './bags';
import { fittingKeys } from './fittings';

// Under the fittings root: the fitting's spec sheet reads the choice too.
export const chosenBuildKeys = {
  all: [...fittingKeys.all, 'chosen-builds'] as const,
  detail: (fittingId: string) => [...chosenBuildKeys.all, fittingId] as const,
};

const path = (fittingId: string) => `/fittings/${encodeURIComponent(fittingId)}/chosen-builds`;

export const chosenBuildsQuery = (fittingId: string) =>
  queryOptions({ queryKey: chosenBuildKeys.detail(fittingId), queryFn: () => api.get<ChosenBuildsView>(path(fittingId)) });

/** The fitting's chosen builds and the bag changes they propose. */
export function useChosenBuildsQuery(fittingId: string) {
  return useQuery(chosenBuildsQuery(fittingId));
}

/** Saves the choice (staff): the answer carries the new proposal. */
export function useSetChosenBuildsMutation(fittingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ChosenBuildsBody) => apiRequest<ChosenBuildsView>('PUT', path(fittingId), { body }),
    onSuccess: (view) => {
      queryClient.setQueryData(chosenBuildKeys.detail(fittingId), view);
      return queryClient.invalidateQueries({ queryKey: fittingKeys.all });
    },
  });
}

/** Confirms the proposal into the bag (staff). */
export function useConfirmChosenBuildsMutation(fittingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ConfirmChosenBuildsBody) => api.post<ChosenBuildsView>(`${path(fittingId)}/confirm`, body),
    onSettled: () => Promise.all([queryClient.invalidateQueries({ queryKey: fittingKeys.all }), queryClient.invalidateQueries({ queryKey: bagKeys.all })]),
  });
}
