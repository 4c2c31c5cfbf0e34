import { Redirect, Stack, useLocalSearchParams } from 'expo-router';
import { BaySafetyNote } from '@/components/fittings/bay-safety-note';
import { ImportFlow } from '@/components/import/import-flow';
import { useGoBack } from '@/components/navigation';
import { useFittingQuery } from '@/components/queries/fittings';
import { isStaff } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { AppText } from '@/components/ui/app-text';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

export default function ImportBayFileScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const me = useMe();
  const goBack = useGoBack({ pathname: '/fittings/[id]', params: { id } });
  const query = useFittingQuery(id);
  // A player imports only into their own remote fitting; any other address sends them home.
  if (query.data && !isStaff(me.role) && !query.data.remote) return <Redirect href="/" />;
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Import a bay file' }} />
      {query.isPending ? <LoadingState label="Loading the fitting…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? (
        <>
          {/* The session starts here: the bay's caution before the first file of a fitting. */}
          {query.data.shotCount === 0 ? <BaySafetyNote /> : null}
          <AppText tone="muted">{`Into the fitting of ${query.data.playerName}.`}</AppText>
          <ImportFlow fittingId={id} units={me.units} canUseRecipes={isStaff(me.role)} onDone={goBack} />
        </>
      ) : null}
    </Screen>
  );
}
