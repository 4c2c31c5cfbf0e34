import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useMe } from '@/components/session/session-provider';
import { useFitterInvitationsQuery } from '@/components/queries/invitations';
import { InvitationList } from '@/components/team/invitation-list';
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
  const invitations = useFitterInvitationsQuery();
  return (
    <Screen>
      <AppText tone="muted">The people who fit at {me.shop.name}. A deactivated fitter can no longer sign in.</AppText>
      <View style={styles.actions}>
        <Button title="Invite a fitter" variant="secondary" compact onPress={() => router.push('/team/new')} />
        <Button title="The shop" variant="secondary" compact onPress={() => router.push('/shop')} />
        <Button title="Decision margins" variant="secondary" compact onPress={() => router.push('/team/margins')} />
        <Button title="Import recipes" variant="secondary" compact onPress={() => router.push('/recipes')} />
      </View>
      <TeamList selfId={me.id} />
      <Section title="Open invitations">{invitations.data ? <InvitationList invitations={invitations.data} /> : null}</Section>
    </Screen>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md } });
