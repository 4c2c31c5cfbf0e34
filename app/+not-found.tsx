import { Stack, useRouter } from 'expo-router';
import { View } from 'react-native';
import { AppHeader } from '@/components/ui/app-header';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { colors } from '@/components/theme';

export default function NotFoundScreen() {
  const router = useRouter();
  const home = () => router.replace('/');
  return (
    <View style={{ flex: 1, backgroundColor: colors.paper }}>
      <Stack.Screen options={{ title: 'Not found · Ovalyard' }} />
      <AppHeader title="Not found" back={{ label: 'Back to the start page', onPress: home }} />
      <Screen>
        <AppText variant="title" accessibilityRole="header">
          This page does not exist
        </AppText>
        <AppText tone="muted">The link may be old, or the page was moved.</AppText>
        <Button title="Back to Ovalyard" variant="secondary" compact onPress={home} />
      </Screen>
    </View>
  );
}
