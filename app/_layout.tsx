import { QueryClientProvider } from '@tanstack/react-query';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { createQueryClient } from '@/components/queries/query-client';
import { SessionProvider } from '@/components/session/session-provider';
import { useAppFonts } from '@/components/use-app-fonts';
import { LoadingState } from '@/components/ui/loading-state';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  // One client per app instance (not a module singleton, so tests can make their own).
  const [queryClient] = useState(createQueryClient);
  // Only the weights the theme uses (WOFF2 on the web, never waited for there).
  const [fontsLoaded, fontError] = useAppFonts();

  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <SessionProvider>
          <StatusBar style="light" />
          {/* A font that fails to load falls back to the system font rather than blocking the app. */}
          {fontsLoaded || fontError ? <Slot /> : <LoadingState label="Opening Ovalyard…" />}
        </SessionProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
