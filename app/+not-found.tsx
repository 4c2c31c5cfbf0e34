import { Link, Stack } from 'expo-router';
import { AppText } from '@/components/ui/app-text';
import { Screen } from '@/components/ui/screen';

export default function NotFoundScreen() {
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Not found' }} />
      <AppText variant="title">This page does not exist</AppText>
      <AppText tone="muted">The link may be old, or the page was moved.</AppText>
      <Link href="/" style={{ minHeight: 44 }}>
        <AppText tone="accent" variant="bodyStrong">
          Back to Ovalyard
        </AppText>
      </Link>
    </Screen>
  );
}
