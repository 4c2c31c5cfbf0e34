import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { WorkshopSettings, WorkshopSettingsBody } from '@/server/schemas';
import { api, apiRequest } from '../api-client';
import { bagKeys } from './bags';

export const workshopSettingsKeys = {
  all: ['workshop-settings'] as const,
};

export const workshopSettingsQuery = () =>
  queryOptions({ queryKey: workshopSettingsKeys.all, queryFn: () => api.get<WorkshopSettings>('/workshop-settings') });

export function useWorkshopSettingsQuery() {
  return useQuery(workshopSettingsQuery());
}

/** Saves the shop's wedge-wear counts and static-fit table (owner). */
export function useSaveWorkshopSettingsMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: WorkshopSettingsBody) => apiRequest<WorkshopSettings>('PUT', '/workshop-settings', { body }),
    onSuccess: (saved) => {
      queryClient.setQueryData(workshopSettingsKeys.all, saved);
      return queryClient.invalidateQueries({ queryKey: bagKeys.all });
    },
  });
}
