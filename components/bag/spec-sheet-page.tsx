import { Stack } from 'expo-router';
import type { UseQueryResult } from '@tanstack/react-query';
import type { SpecSheet } from '@/server/schemas';
import { useMe } from '../session/session-provider';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { SpecSheetActions } from './spec-sheet-actions';
import { SpecSheetDocument } from './spec-sheet-document';

type SpecSheetPageProps = { query: UseQueryResult<SpecSheet>; loadingLabel: string };

/** A spec-sheet page: its actions (send, accept, print) above the sheet, once loaded. */
export function SpecSheetPage({ query, loadingLabel }: SpecSheetPageProps) {
  const me = useMe();
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Spec sheet' }} />
      {query.isPending ? <LoadingState label={loadingLabel} /> : null}
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
