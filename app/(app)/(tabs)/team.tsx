import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useMe } from '@/components/session/session-provider';
import { TeamList } from '@/components/team/team-list';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { space } from '@/components/theme';

/** The owner's team page (the layout sends everyone else to their start page). */
export default function TeamScreen() {
  const router = useRouter();
  const me = useMe();
  return (
    <Screen>
      <AppText tone="muted">The people who fit at {me.shop.name}. A deactivated fitter can no longer sign in.</AppText>
      <View style={styles.actions}>
        <Button title="Add fitter" variant="secondary" compact onPress={() => router.push('/team/new')} />
        <Button title="Decision margins" variant="secondary" compact onPress={() => router.push('/team/margins')} />
        <Button title="Import recipes" variant="secondary" compact onPress={() => router.push('/recipes')} />
      </View>
      <TeamList selfId={me.id} />
    </Screen>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md } });
