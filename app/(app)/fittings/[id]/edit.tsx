import { Stack, useLocalSearchParams } from 'expo-router';
import { FittingForm } from '@/components/fittings/fitting-form';
import { useGoBack } from '@/components/navigation';
import { useFittingQuery, useUpdateFittingMutation } from '@/components/queries/fittings';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

export default function EditFittingScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const goBack = useGoBack({ pathname: '/fittings/[id]', params: { id } });
  const query = useFittingQuery(id);
  const update = useUpdateFittingMutation(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Edit fitting' }} />
      {query.isPending ? <LoadingState label="Loading the fitting…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? (
        <FittingForm
          fitting={query.data}
          submitTitle="Save"
          busy={update.isPending}
          error={update.error}
          onCancel={goBack}
          // The player of a fitting does not change; the rest is sent as a whole.
          onSubmit={({ playerId: _playerId, ...change }) => update.mutate(change, { onSuccess: goBack })}
        />
      ) : null}
    </Screen>
  );
}
