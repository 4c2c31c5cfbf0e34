import { useRouter, type Href } from 'expo-router';
import { useCallback } from 'react';

/** Back to where the user came from, or to `fallback` when the page was opened directly. */
export function useGoBack(fallback: Href) {
  const router = useRouter();
  return useCallback(() => {
    if (router.canGoBack()) router.back();
    else router.replace(fallback);
  }, [router, fallback]);
}
