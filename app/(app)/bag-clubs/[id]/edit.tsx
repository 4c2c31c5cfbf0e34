import { Stack, useLocalSearchParams } from 'expo-router';
import { BagClubForm } from '@/components/bag/bag-club-form';
import { clubName } from '@/components/bag/bag-words';
import { useGoBack } from '@/components/navigation';
import { useBagQuery, useUpdateBagClubMutation } from '@/components/queries/bags';
import { useMe } from '@/components/session/session-provider';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

/** /bag-clubs/:id/edit?playerId=… — every spec of a bag club (staff); a stale save is told to reload. */
export default function EditBagClubScreen() {
  const { id, playerId = '' } = useLocalSearchParams<{ id: string; playerId?: string }>();
  const me = useMe();
  const goBack = useGoBack({ pathname: '/players/[id]/bag', params: { id: playerId } });
  const query = useBagQuery(playerId);
  const update = useUpdateBagClubMutation();
  const club = query.data?.clubs.find((c) => c.id === id) ?? null;
  return (
    <Screen>
      <Stack.Screen options={{ title: club ? `Edit the ${clubName(club.club).toLowerCase()}` : 'Edit club' }} />
      {query.isPending ? <LoadingState label="Loading the club…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data && !club ? <Notice tone="danger" title="Club not found">Open the club from its bag.</Notice> : null}
      {club ? (
        <BagClubForm
          key={`${club.id}-${club.version}`}
          club={club}
          units={me.units}
          busy={update.isPending}
          error={update.error}
          onCancel={goBack}
          onReload={() => {
            update.reset();
            void query.refetch();
          }}
          onSubmit={(body) => update.mutate({ id: club.id, change: { ...body, version: club.version } }, { onSuccess: goBack })}
        />
      ) : null}
    </Screen>
  );
}
