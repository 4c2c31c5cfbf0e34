import { useEffect, useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { Fitting } from '@/server/schemas';
import { ChipRow } from '../analysis/chip-row';
import { courseChanges } from '../analysis/course-changes';
import { CourseConditions } from '../analysis/course-conditions';
import { HeadToHeadSection } from '../analysis/head-to-head-section';
import { LaunchWindowSection } from '../analysis/launch-window-section';
import { OddsSection } from '../analysis/odds-section';
import { OvalSection } from '../analysis/oval-section';
import { analysisShots } from '../analysis/plot-shots';
import { errorMessage } from '../api-client';
import { formatAir } from '../format';
import { useFittingAnalysisQuery, useShotDecisionMutation, type AnalysisParams } from '../queries/analysis';
import { usePlayerQuery } from '../queries/players';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { SwitchField } from '../ui/switch-field';
import type { FittingPageState } from './use-fitting-page-state';

type DecideViewProps = { fitting: Fitting; state: FittingPageState };

/** Altitude and temperature in the user's units, e.g. "5249.3 ft, 86 °F". */
const airWords = (altitudeM: number, temperatureC: number, me: Parameters<typeof formatAir>[2]) => `${formatAir(altitudeM, 'altitude', me)}, ${formatAir(temperatureC, 'temperature', me)}`;

/**
 * What the fitter decides from, per club: where the shots land (with the strays), the
 * head-to-head of two builds, the on-target odds, the launch window, and the figures at the
 * player's course.
 */
export function DecideView({ fitting, state }: DecideViewProps) {
  const me = useMe();
  const base: AnalysisParams = { level: 0.95, includeStrays: state.includeStrays, compare: null, to: state.to, odds: state.odds };
  const query = useFittingAnalysisQuery(fitting.id, base);
  const measured = useFittingAnalysisQuery(fitting.id, { ...base, to: null }, { enabled: state.to !== null });
  const decide = useShotDecisionMutation(fitting.id);
  const player = usePlayerQuery(fitting.playerId, { enabled: isStaff(me.role) });
  const data = query.data;
  const clubs = useMemo(() => [...new Set(data?.analysis.groups.map((g) => g.club) ?? [])], [data]);
  const club = state.club && clubs.includes(state.club) ? state.club : (clubs[0] ?? null);
  const builds = useMemo(() => (data?.analysis.groups ?? []).filter((g) => g.club === club && g.build !== null).map((g) => g.build!), [data, club]);
  const { pair, setPair } = state;
  useEffect(() => {
    if (builds.length >= 2 && (!pair || !builds.includes(pair[0]) || !builds.includes(pair[1]))) setPair([builds[0], builds[1]]);
  }, [builds, pair, setPair]);
  const compare: [string, string] | null = club && pair && builds.includes(pair[0]) && builds.includes(pair[1]) ? [`${club}|${pair[0]}`, `${club}|${pair[1]}`] : null;
  const h2h = useFittingAnalysisQuery(fitting.id, { ...base, compare }, { enabled: compare !== null });
  const shots = useMemo(() => (data ? analysisShots(data) : []), [data]);

  if (query.isPending) return <LoadingState label="Working out the analysis…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const { analysis, air } = query.data;
  const units = me.units;
  const clubGroups = analysis.groups.filter((g) => g.club === club);
  const speeds = clubGroups.map((g) => g.fields.ballSpeed).filter((s) => s != null);
  const ballSpeed = speeds.length ? speeds.reduce((sum, s) => sum + s!.mean * s!.n, 0) / speeds.reduce((n, s) => n + s!.n, 0) : null;
  const changes = state.to && measured.data && club ? courseChanges(measured.data.analysis.groups, analysis.groups, club) : [];
  const name = club ? (clubInfo(club)?.label ?? club) : '';
  return (
    <View style={styles.view}>
      {state.to ? (
        <Notice tone="info" title="At the player’s course">
          {`Figures as the ball-flight model expects them at ${airWords(state.to.altitudeM ?? 0, state.to.temperatureC ?? 15, me)}; measured in the bay at ${airWords(air.measured.altitudeM ?? 0, air.measured.temperatureC ?? 15, me)}. The strays are the measured ones.`}
        </Notice>
      ) : null}
      <ChipRow label="Club" value={club} options={clubs.map((c) => ({ value: c, label: clubInfo(c)?.label ?? c }))} onChange={state.setClub} />
      {club ? (
        <Section title={`${name}: where the shots land`}>
          <OvalSection
            club={club}
            groups={analysis.groups}
            shots={shots}
            units={units}
            canDecide={isStaff(me.role)}
            deciding={decide.isPending}
            onDecide={(shotId, decision) => decide.mutate({ shotId, decision })}
            hand={player.data?.handedness}
          />
          {decide.error ? <AppText tone="danger">{errorMessage(decide.error)}</AppText> : null}
          <SwitchField label="Count strays" hint="Off: misreads and mishits are left out of the figures; shots only for review stay in." value={state.includeStrays} onChange={state.setIncludeStrays} />
        </Section>
      ) : null}
      {club && builds.length >= 2 && pair ? (
        <Section title="Head-to-head">
          <HeadToHeadSection builds={builds} a={pair[0]} b={pair[1]} onChange={(a, b) => setPair([a, b])} headToHead={h2h.data?.analysis.headToHead} loading={h2h.isFetching} units={units} />
        </Section>
      ) : null}
      {club ? (
        <Section title="On target">
          <OddsSection key={club} club={club} groups={clubGroups} units={units} odds={state.odds} onChange={state.setOdds} />
        </Section>
      ) : null}
      {club ? (
        <Section title="Launch window">
          <LaunchWindowSection shots={shots.filter((s) => s.club === club)} ballSpeedMps={ballSpeed} air={air.normalisedTo ?? air.measured} units={units} club={club} />
        </Section>
      ) : null}
      <Section title="At the player’s course">
        <CourseConditions value={state.to} onChange={state.setTo} changes={changes} busy={query.isFetching || measured.isFetching} units={units} altitudeUnit={me.altitudeUnit} temperatureUnit={me.temperatureUnit} />
      </Section>
    </View>
  );
}

const styles = StyleSheet.create({ view: { gap: space.xl } });
