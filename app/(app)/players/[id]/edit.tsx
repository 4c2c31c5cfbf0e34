import { Stack, useLocalSearchParams } from 'expo-router';
import { useGoBack } from '@/components/navigation';
import { PlayerForm } from '@/components/players/player-form';
import { usePlayerQuery, useUpdatePlayerMutation } from '@/components/queries/players';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

export default function EditPlayerScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const goBack = useGoBack({ pathname: '/players/[id]', params: { id } });
  const query = usePlayerQuery(id);
  const update = useUpdatePlayerMutation(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: query.data ? `Edit ${query.data.name}` : 'Edit player' }} />
      {query.isPending ? <LoadingState label="Loading the player…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? (
        <PlayerForm
          player={query.data}
          submitTitle="Save"
          busy={update.isPending}
          error={update.error}
          onCancel={goBack}
          onSubmit={(body) => update.mutate(body, { onSuccess: goBack })}
        />
      ) : null}
    </Screen>
  );
}
