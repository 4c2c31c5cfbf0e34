import { Stack, useLocalSearchParams } from 'expo-router';
import { PlayerInvitation } from '@/components/players/player-invitation';
import { usePlayerQuery } from '@/components/queries/players';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function InvitePlayerScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const query = usePlayerQuery(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Invite to sign in' }} />
      {query.isPending ? <LoadingState label="Loading the player…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data?.hasAccount ? <Notice tone="success">{`${query.data.name} signs in already.`}</Notice> : null}
      {query.data && !query.data.hasAccount ? <PlayerInvitation player={query.data} /> : null}
    </Screen>
  );
}
