import { Stack, useLocalSearchParams } from 'expo-router';
import { RemapFlow } from '@/components/import/remap-flow';
import { useGoBack } from '@/components/navigation';
import { useBayFileQuery } from '@/components/queries/bay-files';
import { useMe } from '@/components/session/session-provider';
import { AppText } from '@/components/ui/app-text';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

export default function RemapBayFileScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const me = useMe();
  const query = useBayFileQuery(id);
  const fittingId = query.data?.fittingId;
  const goBack = useGoBack(fittingId ? { pathname: '/fittings/[id]', params: { id: fittingId } } : '/fittings');
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Change mapping' }} />
      {query.isPending ? <LoadingState label="Loading the bay file…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? (
        <>
          <AppText variant="title" accessibilityRole="header">{`Change the mapping of ${query.data.fileName}`}</AppText>
          <RemapFlow bayFile={query.data} units={me.units} onDone={goBack} />
        </>
      ) : null}
    </Screen>
  );
}
