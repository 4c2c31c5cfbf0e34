import { Inter_400Regular } from '@expo-google-fonts/inter/400Regular';
import { Inter_500Medium } from '@expo-google-fonts/inter/500Medium';
import { Inter_600SemiBold } from '@expo-google-fonts/inter/600SemiBold';
import { Inter_700Bold } from '@expo-google-fonts/inter/700Bold';
import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { createQueryClient } from '@/components/queries/query-client';
import { SessionProvider } from '@/components/session/session-provider';
import { LoadingState } from '@/components/ui/loading-state';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  // One client per app instance (not a module singleton, so tests can make their own).
  const [queryClient] = useState(createQueryClient);
  // Only the weights the theme uses; each by its subpath so the others stay out of the bundle.
  const [fontsLoaded, fontError] = useFonts({ Inter_400Regular, Inter_500Medium, Inter_600SemiBold, Inter_700Bold });

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
