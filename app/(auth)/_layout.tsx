import { Redirect, Stack } from 'expo-router';
import { useSession } from '@/components/session/session-provider';
import { LoadingState } from '@/components/ui/loading-state';

export { ErrorBoundary } from 'expo-router';

/** Sign-in and friends; a signed-in user goes straight to the app. */
export default function AuthLayout() {
  const session = useSession();
  if (session.status === 'loading') return <LoadingState />;
  if (session.status === 'signed-in') return <Redirect href="/" />;
  return <Stack screenOptions={{ headerShown: false }} />;
}
