import { Stack, useLocalSearchParams } from 'expo-router';
import { useGoBack } from '@/components/navigation';
import { PlayerAccountForm } from '@/components/players/player-account-form';
import { usePlayerQuery } from '@/components/queries/players';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function GivePlayerSignInScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const goBack = useGoBack({ pathname: '/players/[id]', params: { id } });
  const query = usePlayerQuery(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Give sign-in' }} />
      {query.isPending ? <LoadingState label="Loading the player…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data?.hasAccount ? <Notice tone="success">{query.data.name} already has a sign-in.</Notice> : null}
      {query.data && !query.data.hasAccount ? <PlayerAccountForm player={query.data} onDone={goBack} onCancel={goBack} /> : null}
    </Screen>
  );
}
