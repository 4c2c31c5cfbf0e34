import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SpecSheet } from '@/server/schemas';
import { api } from '../api-client';
import { fittingKeys } from './fittings';

export const specSheetKeys = {
  all: [...fittingKeys.all, 'spec-sheets'] as const,
  ofFitting: (fittingId: string) => [...specSheetKeys.all, 'fitting', fittingId] as const,
  detail: (id: string) => [...specSheetKeys.all, 'detail', id] as const,
};

const enc = encodeURIComponent;

export const fittingSpecSheetQuery = (fittingId: string) =>
  queryOptions({ queryKey: specSheetKeys.ofFitting(fittingId), queryFn: () => api.get<SpecSheet>(`/fittings/${enc(fittingId)}/spec-sheet`) });
export const specSheetQuery = (id: string) =>
  queryOptions({ queryKey: specSheetKeys.detail(id), queryFn: () => api.get<SpecSheet>(`/spec-sheets/${enc(id)}`) });

/** A fitting's spec sheet: the sent one, or (staff) the draft. */
export function useFittingSpecSheetQuery(fittingId: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...fittingSpecSheetQuery(fittingId), enabled: options.enabled ?? true });
}

/** A sent spec sheet (the link in the e-mail). */
export function useSpecSheetQuery(id: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...specSheetQuery(id), enabled: (options.enabled ?? true) && id !== '' });
}

/** The PDF's address (served with the session cookie). */
export const specSheetPdfUrl = (id: string, paper: 'a4' | 'letter' = 'a4') => `/api/spec-sheets/${enc(id)}/pdf?paper=${paper}`;

/** Sends the sheet to the player (staff). */
export function useSendSpecSheetMutation(fittingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<SpecSheet>(`/fittings/${enc(fittingId)}/spec-sheet/send`),
    onSuccess: (sheet) => {
      queryClient.setQueryData(specSheetKeys.ofFitting(fittingId), sheet);
      return queryClient.invalidateQueries({ queryKey: specSheetKeys.all });
    },
  });
}

/** The player accepts their sheet. */
export function useAcceptSpecSheetMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.post<SpecSheet>(`/spec-sheets/${enc(id)}/accept`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: specSheetKeys.all }),
  });
}
