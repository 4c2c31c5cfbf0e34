import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { clubInfo } from '@/analysis/clubs';
import { BagClubSpecs } from '@/components/bag/bag-club-specs';
import { BagHistoryList } from '@/components/bag/bag-history-list';
import { clubName } from '@/components/bag/bag-words';
import { WearForm } from '@/components/bag/wear-form';
import { useBagQuery } from '@/components/queries/bags';
import { isStaff } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';

/** /bag-clubs/:id?playerId=… — one club of a bag: its specs and carry, wedge wear, its history. */
export default function BagClubScreen() {
  const { id, playerId = '' } = useLocalSearchParams<{ id: string; playerId?: string }>();
  const me = useMe();
  const router = useRouter();
  const query = useBagQuery(playerId || me.playerId || '');
  const club = query.data?.clubs.find((c) => c.id === id) ?? null;
  return (
    <Screen>
      <Stack.Screen options={{ title: club ? clubName(club.club) : 'Club' }} />
      {query.isPending ? <LoadingState label="Loading the club…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data && !club ? <Notice tone="danger" title="Club not found">Open the club from its bag.</Notice> : null}
      {club && query.data ? (
        <>
          <Section
            title="Build and carry"
            action={
              isStaff(me.role) || me.playerId === query.data.playerId ? (
                <Button title="Edit" compact variant="secondary" onPress={() => router.push({ pathname: '/bag-clubs/[id]/edit', params: { id, playerId: query.data.playerId } })} />
              ) : null
            }
          >
            <BagClubSpecs club={club} units={me.units} />
          </Section>
          {clubInfo(club.club)?.kind === 'wedge' && club.status !== 'out' ? (
            <Section title="Wear">
              <WearForm club={club} limits={query.data.wedgeWearLimits} />
            </Section>
          ) : null}
          <Section title="History">
            <BagHistoryList bagClubId={club.id} />
          </Section>
        </>
      ) : null}
    </Screen>
  );
}
