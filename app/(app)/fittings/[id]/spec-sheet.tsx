import { Stack, useLocalSearchParams } from 'expo-router';
import { SpecSheetActions } from '@/components/bag/spec-sheet-actions';
import { SpecSheetDocument } from '@/components/bag/spec-sheet-document';
import { useFittingSpecSheetQuery } from '@/components/queries/spec-sheets';
import { useMe } from '@/components/session/session-provider';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

/** /fittings/:id/spec-sheet — the fitting's sheet: the draft (staff) or the sent one. */
export default function FittingSpecSheetScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const me = useMe();
  const query = useFittingSpecSheetQuery(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Spec sheet' }} />
      {query.isPending ? <LoadingState label="Writing up the spec sheet…" /> : null}
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
