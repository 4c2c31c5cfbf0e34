import { PlayerRecordActions } from '@/components/players/player-record-actions';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { FittingList } from '@/components/fittings/fitting-list';
import { PlayerProfile } from '@/components/players/player-profile';
import { usePlayerQuery } from '@/components/queries/players';
import { isStaff } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { space } from '@/components/theme';

export default function PlayerScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const me = useMe();
  const staff = isStaff(me.role);
  const query = usePlayerQuery(id);

  if (query.isPending) return <LoadingState label="Loading the player…" />;
  if (query.isError) {
    return (
      <Screen>
        <Stack.Screen options={{ title: 'Player' }} />
        <ErrorState error={query.error} onRetry={() => void query.refetch()} />
      </Screen>
    );
  }
  const player = query.data;
  return (
    <Screen>
      <Stack.Screen options={{ title: player.name }} />
      <Section title="Profile">
        <PlayerProfile player={player} />
        {staff ? (
          <View style={styles.actions}>
            <Button title="Edit" variant="secondary" compact onPress={() => router.push({ pathname: '/players/[id]/edit', params: { id } })} />
            {player.hasAccount ? null : (
              <Button
                title="Invite to sign in"
                variant="secondary"
                compact
                onPress={() => router.push({ pathname: '/players/[id]/account', params: { id } })}
              />
            )}
          </View>
        ) : null}
      </Section>
      <Section title="Their records">
        <PlayerRecordActions player={player} staff={staff} onDeleted={() => router.replace('/players')} />
      </Section>
      <Section title="Bag">
        <Button title={staff ? 'Open the bag' : 'Open your bag'} variant="secondary" compact onPress={() => router.push({ pathname: '/players/[id]/bag', params: { id } })} />
      </Section>
      <Section
        title="Fittings"
        action={
          staff ? (
            <Button
              title="New fitting"
              compact
              onPress={() => router.push({ pathname: '/fittings/new', params: { playerId: id } })}
            />
          ) : null
        }
      >
        <FittingList
          filters={{ playerId: id }}
          showPlayer={false}
          emptyTitle="No fittings yet"
          emptyMessage={staff ? `Start ${player.name}'s first fitting with “New fitting”.` : 'Your fittings appear here.'}
        />
      </Section>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
