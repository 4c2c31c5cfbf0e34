import { Redirect, Stack } from 'expo-router';
import { guardedScreen } from '@/components/session/route-guard';
import { useSession } from '@/components/session/session-provider';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { headerOptions } from '@/components/ui/stack-options';

export { ErrorBoundary } from 'expo-router';

/**
 * Signed-in part of the app. GET /api/me decides: no session → sign-in; a page the role may not
 * open (components/session/route-access.ts) → the role's start page, from inside the Stack. The guards are a
 * convenience; the server authorises every request again.
 */
export default function AppLayout() {
  const session = useSession();
  if (session.status === 'loading') return <LoadingState label="Checking your session…" />;
  if (session.status === 'signed-out') return <Redirect href="/sign-in" />;
  if (session.status === 'error') {
    return (
      <Screen>
        <ErrorState error={session.error} onRetry={session.retry} title="Ovalyard could not load your account" />
      </Screen>
    );
  }
  return (
    <Stack screenOptions={headerOptions} screenLayout={guardedScreen}>
      <Stack.Screen name="(tabs)" options={{ headerShown: false }} />
    </Stack>
  );
}
