import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { specNumber } from '@/analysis/bag';
import { formatDate } from '../format';
import { useWidth } from '../analysis/use-width';
import { useBagQuery } from '../queries/bags';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/empty-state';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { BagChecksList } from './bag-checks-list';
import { BagClubRow } from './bag-club-row';
import { BagDatePicker } from './bag-date-picker';
import { BagLadderChart } from './bag-ladder-chart';
import { BagLadderTable } from './bag-ladder-table';

type BagViewProps = { playerId: string };

/** A player's bag: its clubs, the ladder, the notes on the rules, and the bag as it was on a date. */
export function BagView({ playerId }: BagViewProps) {
  const me = useMe();
  const router = useRouter();
  const staff = isStaff(me.role);
  // The player keeps their own bag too (a remote fitting's intake starts from it).
  const mayEdit = staff || me.playerId === playerId;
  const [on, setOn] = useState<string | null>(null);
  const query = useBagQuery(playerId, on);
  const [width, onLayout] = useWidth();

  if (query.isPending) return <LoadingState label="Loading the bag…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const bag = query.data;
  const inBag = bag.clubs.filter((c) => c.status !== 'out');
  const out = bag.clubs.filter((c) => c.status === 'out');
  const estimates = bag.ladder.some((r) => r.carrySource === 'estimate');
  return (
    <View style={styles.page}>
      <BagDatePicker on={on} onChange={setOn} />
      {on ? <Notice tone="info">{`The bag as recorded at the end of ${formatDate(on)}. Carries are today’s figures.`}</Notice> : null}
      <Section
        title={`Clubs (${inBag.length})`}
        action={mayEdit && !on ? <Button title="Add a club" compact onPress={() => router.push({ pathname: '/players/[id]/bag-clubs/new', params: { id: playerId } })} /> : null}
      >
        {inBag.length === 0 ? (
          <EmptyState title="No clubs yet" message={staff ? 'Add the clubs the player carries, or confirm chosen builds from a fitting.' : 'Add the clubs you carry, or your fitter records them here.'} />
        ) : (
          <Card>
            {inBag.map((c) => (
              <BagClubRow key={c.id} club={c} units={me.units} playerId={playerId} readOnly={on !== null} />
            ))}
          </Card>
        )}
      </Section>
      <Section title="Ladder">
        <View onLayout={onLayout} style={styles.chart}>
          {width > 0 && bag.ladder.some((r) => r.carryM !== null) ? <BagLadderChart ladder={bag.ladder} units={me.units} widthPx={width} /> : null}
        </View>
        <BagLadderTable ladder={bag.ladder} units={me.units} />
        {estimates ? (
          <AppText variant="caption" tone="muted">
            An estimate is the ball-flight model’s carry for the club’s loft at the player’s speed, worked out from the club hit nearest in loft (or the club speed measured in the latest fitting). A fitting that hits the club replaces it.
          </AppText>
        ) : null}
      </Section>
      <Section title="Notes on the rules">
        <BagChecksList checks={bag.checks} empty="No notes: nothing here raises the length, loft or 14-club rules." />
        <AppText variant="caption" tone="muted">Reminders only: the governing bodies’ rules and the committee in charge of a competition decide.</AppText>
      </Section>
      {bag.staticFit && staff ? (
        <Section title="Static-fit starting point">
          <AppText>
            {`From height and wrist-to-floor, the shop’s table starts at ${bag.staticFit.lengthChangeIn === 0 ? 'standard length' : `${bag.staticFit.lengthChangeIn > 0 ? '+' : '−'}${specNumber(Math.abs(bag.staticFit.lengthChangeIn))} in`} and ${bag.staticFit.lieChangeDeg === 0 ? 'standard lie' : `${specNumber(Math.abs(bag.staticFit.lieChangeDeg))}° ${bag.staticFit.lieChangeDeg > 0 ? 'upright' : 'flat'}`}. A starting point only: check the lie dynamically.`}
          </AppText>
          <Button title="Workshop settings" variant="quiet" compact onPress={() => router.push('/workshop-settings')} />
        </Section>
      ) : null}
      {out.length > 0 ? (
        <Section title={`Out of the bag (${out.length})`}>
          <Card>
            {out.map((c) => (
              <BagClubRow key={c.id} club={c} units={me.units} playerId={playerId} readOnly={on !== null} />
            ))}
          </Card>
        </Section>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  page: { gap: space.xl },
  chart: { width: '100%' },
});
