import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { formatDate } from '../format';
import { useBagQuery } from '../queries/bags';
import { useBuildsQuery } from '../queries/builds';
import { useChosenBuildsQuery } from '../queries/chosen-builds';
import { useFittingSpecSheetQuery } from '../queries/spec-sheets';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { buildName } from '../builds/build-summary';
import { clubName } from './bag-words';
import { ChooseBuildsForm } from './choose-builds-form';

type ChooseBuildsSectionProps = { fitting: Fitting };

/**
 * Where a fitting ends: the chosen build per club, the bag changes they make, and the spec
 * sheet. Staff choose and confirm; the player reads the choice and opens the sent sheet.
 */
export function ChooseBuildsSection({ fitting }: ChooseBuildsSectionProps) {
  const me = useMe();
  const router = useRouter();
  const staff = isStaff(me.role);
  const chosen = useChosenBuildsQuery(fitting.id);
  const builds = useBuildsQuery(fitting.id);
  const bag = useBagQuery(fitting.playerId, null, { enabled: staff });
  const sheet = useFittingSpecSheetQuery(fitting.id, { enabled: !staff || Boolean(chosen.data?.builds.length) });
  const openBag = () => router.push({ pathname: '/players/[id]/bag', params: { id: fitting.playerId } });
  const openSheet = () => router.push({ pathname: '/fittings/[id]/spec-sheet', params: { id: fitting.id } });

  const loading = chosen.isPending || builds.isPending || (staff && bag.isPending);
  const error = chosen.error ?? builds.error ?? (staff ? bag.error : null);
  return (
    <Section title="Chosen for the bag">
      {loading && !error ? <LoadingState label="Loading the chosen builds…" /> : null}
      {error ? <ErrorState error={error} onRetry={() => void Promise.all([chosen.refetch(), builds.refetch(), bag.refetch()])} /> : null}
      {chosen.data && builds.data ? (
        chosen.data.confirmedAt || !staff ? (
          <View style={styles.block}>
            {chosen.data.builds.length === 0 ? (
              <AppText tone="muted">{staff ? 'No build chosen.' : 'Your fitter has not chosen builds yet.'}</AppText>
            ) : (
              chosen.data.builds.map((b) => <AppText key={b.buildId}>{`${clubName(b.club)}: ${buildName(b.label)}`}</AppText>)
            )}
            {chosen.data.confirmedAt ? <Notice tone="success">{`In the bag since ${formatDate(chosen.data.confirmedAt.slice(0, 10))}.`}</Notice> : null}
          </View>
        ) : builds.data.length === 0 ? (
          <AppText tone="muted">Choose builds once a bay file is in.</AppText>
        ) : bag.data ? (
          <ChooseBuildsForm key={`${chosen.data.builds.map((b) => b.buildId).join()}|${chosen.data.takeOut.join()}`} fittingId={fitting.id} builds={builds.data} bag={bag.data.clubs} saved={chosen.data} />
        ) : null
      ) : null}
      <View style={styles.actions}>
        <Button title={staff ? 'Open the bag' : 'Open your bag'} variant="secondary" compact onPress={openBag} />
        {staff && chosen.data?.builds.length ? <Button title="Spec sheet" variant="secondary" compact onPress={openSheet} /> : null}
        {!staff && sheet.data ? <Button title="Your spec sheet" compact onPress={openSheet} /> : null}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
