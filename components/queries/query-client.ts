import { QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from '../api-client';
import { meKeys } from './me';

/** The app's one QueryClient; its defaults are set here once. */
export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      // A session that ends mid-use (expired, signed out elsewhere): let the session query
      // find out, so the guard sends the user to sign-in instead of showing broken lists.
      onError: (error, query) => {
        if (error instanceof ApiError && error.status === 401 && query.queryKey[0] !== meKeys.all[0]) {
          void client.invalidateQueries({ queryKey: meKeys.all });
        }
      },
    }),
    defaultOptions: {
      queries: {
        // Shop data changes when a colleague edits it; 30 s keeps screens fresh without
        // refetching on every tab switch.
        staleTime: 30_000,
        // Retry only what may pass on a second try (network, 5xx); 4xx answers will not change.
        retry: (failureCount, error) =>
          failureCount < 2 && !(error instanceof ApiError && error.status >= 400 && error.status < 500),
        // A fitter switching between the bay PC's windows should not trigger refetch storms.
        refetchOnWindowFocus: false,
      },
      mutations: {
        // Writes are never repeated behind the user's back.
        retry: false,
      },
    },
  });
  return client;
}
