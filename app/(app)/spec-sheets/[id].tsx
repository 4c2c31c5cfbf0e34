import { Stack, useLocalSearchParams } from 'expo-router';
import { SpecSheetActions } from '@/components/bag/spec-sheet-actions';
import { SpecSheetDocument } from '@/components/bag/spec-sheet-document';
import { useSpecSheetQuery } from '@/components/queries/spec-sheets';
import { useMe } from '@/components/session/session-provider';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

/** /spec-sheets/:id — a sent sheet, as the e-mail links it: the player reads and accepts it here. */
export default function SpecSheetScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const me = useMe();
  const query = useSpecSheetQuery(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Spec sheet' }} />
      {query.isPending ? <LoadingState label="Loading the spec sheet…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? (
        <>
          <SpecSheetActions sheet={query.data} />
          <SpecSheetDocument sheet={query.data} units={me.units} />
        </>
      ) : null}
    </Screen>
  );
}
