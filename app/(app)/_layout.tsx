import { Redirect, Stack } from 'expo-router';
import { useSession } from '@/components/session/session-provider';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { HeaderHomeButton } from '@/components/ui/header-home-button';
import { headerOptions } from '@/components/ui/stack-options';

export { ErrorBoundary } from 'expo-router';

/**
 * Signed-in part of the app. GET /api/me decides: no session → sign-in. The guard is a
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
    <Stack
      screenOptions={({ navigation }) => ({
        ...headerOptions,
        headerBackTitle: 'Back',
        // A page opened by its address has no history: offer the way to the start page instead.
        ...(navigation.canGoBack() ? {} : { headerLeft: () => <HeaderHomeButton /> }),
      })}
    >
      <Stack.Screen name="(tabs)" options={{ headerShown: false }} />
    </Stack>
  );
}
