import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { ChooseBuildsSection } from '@/components/bag/choose-builds-section';
import { FittingBuilds } from '@/components/builds/fitting-builds';
import { DecideView } from '@/components/fittings/decide-view';
import { FittingStart } from '@/components/fittings/fitting-start';
import { FITTING_VIEWS, fittingView } from '@/components/fittings/fitting-views';
import { LadderView } from '@/components/fittings/ladder-view';
import { SessionView } from '@/components/fittings/session-view';
import { ShotsView } from '@/components/fittings/shots-view';
import { useFittingPageState } from '@/components/fittings/use-fitting-page-state';
import { formatDate } from '@/components/format';
import { CourseSection } from '@/components/remote/course-section';
import { PlayerFittingView } from '@/components/remote/player-fitting-view';
import { useFittingQuery } from '@/components/queries/fittings';
import { isStaff } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { SegmentedControl } from '@/components/ui/segmented-control';

export default function FittingScreen() {
  const { id, view } = useLocalSearchParams<{ id: string; view?: string }>();
  const router = useRouter();
  const me = useMe();
  const query = useFittingQuery(id);
  const state = useFittingPageState();
  const current = fittingView(view);

  if (query.isPending) return <LoadingState label="Loading the fitting…" />;
  if (query.isError) {
    return (
      <Screen>
        <Stack.Screen options={{ title: 'Fitting' }} />
        <ErrorState error={query.error} onRetry={() => void query.refetch()} />
      </Screen>
    );
  }
  const fitting = query.data;
  const empty = fitting.shotCount === 0;
  // A player sees their own view whatever the address asks for (?view= is the staff's).
  if (!isStaff(me.role)) {
    return (
      <Screen>
        <Stack.Screen options={{ title: `${fitting.playerName} · ${formatDate(fitting.date)}` }} />
        <PlayerFittingView fitting={fitting} />
      </Screen>
    );
  }
  return (
    <Screen>
      <Stack.Screen options={{ title: `${fitting.playerName} · ${formatDate(fitting.date)}` }} />
      <CourseSection fitting={fitting} staff />
      <SegmentedControl label="Views of the fitting" value={current} options={FITTING_VIEWS} onChange={(v) => router.setParams({ view: v })} />
      {empty && (current === 'decide' || current === 'shots' || current === 'ladder') ? <FittingStart fitting={fitting} canImport /> : null}
      {!empty && current === 'decide' ? <DecideView fitting={fitting} state={state} /> : null}
      {!empty && current === 'shots' ? <ShotsView fitting={fitting} state={state} /> : null}
      {!empty && current === 'ladder' ? <LadderView fitting={fitting} state={state} /> : null}
      {current === 'builds' ? <FittingBuilds fitting={fitting} /> : null}
      {current === 'builds' ? <ChooseBuildsSection fitting={fitting} /> : null}
      {current === 'session' ? <SessionView fitting={fitting} /> : null}
    </Screen>
  );
}
