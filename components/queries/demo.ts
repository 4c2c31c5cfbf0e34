import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DemoStatus } from '@/server/schemas';
import { api } from '../api-client';

export const demoKeys = {
  all: ['demo'] as const,
};

export const getDemoStatus = () => api.get<DemoStatus>('/demo');

export const demoStatusQuery = () =>
  queryOptions({
    queryKey: demoKeys.all,
    queryFn: getDemoStatus,
    // Whether the demo is loaded does not change while the page is open.
    staleTime: Infinity,
    // No demo hint is the safe answer; a failed check is not worth retrying.
    retry: false,
  });

/** Whether the invented demo is loaded (the sign-in screen then shows its sign-ins); false until known. */
export function useDemoLoaded(): boolean {
  return useQuery(demoStatusQuery()).data?.demo === true;
}
