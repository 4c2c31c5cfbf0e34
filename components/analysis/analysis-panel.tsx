import { useEffect, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { Fitting } from '@/server/schemas';
import { LadderChart } from '../charts';
import { errorMessage } from '../api-client';
import { useFittingAnalysisQuery, useShotDecisionMutation, type AnalysisParams } from '../queries/analysis';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { SwitchField } from '../ui/switch-field';
import { ChipRow } from './chip-row';
import { CourseConditions } from './course-conditions';
import { formatField } from '../format-field';
import { GroupTable } from './group-table';
import { HeadToHeadSection } from './head-to-head-section';
import { LaunchWindowSection } from './launch-window-section';
import { OvalSection } from './oval-section';
import { useWidth } from './use-width';

type AnalysisPanelProps = { fitting: Fitting };

/** A fitting's analysis: per club the ovals and strays, the groups table, head-to-head, launch window, ladder. */
export function AnalysisPanel({ fitting }: AnalysisPanelProps) {
  const me = useMe();
  const [includeStrays, setIncludeStrays] = useState(false);
  const [to, setTo] = useState<AnalysisParams['to']>(null);
  const [club, setClub] = useState<string | null>(null);
  const [pair, setPair] = useState<[string, string] | null>(null);
  const base: AnalysisParams = { level: 0.95, includeStrays, compare: null, to };
  const query = useFittingAnalysisQuery(fitting.id, base);
  const decide = useShotDecisionMutation(fitting.id);
  const [ladderWidth, onLadderLayout] = useWidth();

  const data = query.data;
  const clubs = useMemo(() => [...new Set(data?.analysis.groups.map((g) => g.club) ?? [])], [data]);
  const chosen = club && clubs.includes(club) ? club : (clubs[0] ?? null);
  const builds = useMemo(
    () => (data?.analysis.groups ?? []).filter((g) => g.club === chosen && g.build !== null).map((g) => g.build!) ,
    [data, chosen],
  );
  useEffect(() => {
    if (builds.length >= 2 && (!pair || !builds.includes(pair[0]) || !builds.includes(pair[1]))) setPair([builds[0], builds[1]]);
  }, [builds, pair]);
  const compare: [string, string] | null = chosen && pair && builds.includes(pair[0]) && builds.includes(pair[1]) ? [`${chosen}|${pair[0]}`, `${chosen}|${pair[1]}`] : null;
  const h2h = useFittingAnalysisQuery(fitting.id, { ...base, compare }, { enabled: compare !== null });

  if (query.isPending) return <LoadingState label="Working out the analysis…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const { analysis, shots, air } = query.data;
  const units = me.units;
  const clubGroups = analysis.groups.filter((g) => g.club === chosen);
  const ballSpeeds = clubGroups.map((g) => g.fields.ballSpeed).filter((s) => s != null);
  const ballSpeed = ballSpeeds.length ? ballSpeeds.reduce((sum, s) => sum + s!.mean * s!.n, 0) / ballSpeeds.reduce((n, s) => n + s!.n, 0) : null;

  return (
    <View style={styles.panel}>
      {to ? (
        <Notice tone="info" title="Carried over to the course">
          {`Figures as the ball-flight model expects them at ${to.altitudeM ?? 0} m, ${to.temperatureC ?? 15} °C${to.humidityPct !== undefined ? `, ${to.humidityPct} % humidity` : ''}, ${to.firmness ?? 'normal'} ground; measured in the bay at ${air.measured.altitudeM ?? 0} m, ${air.measured.temperatureC ?? 15} °C.`}
        </Notice>
      ) : null}
      <ChipRow label="Club" value={chosen} options={clubs.map((c) => ({ value: c, label: clubInfo(c)?.label ?? c }))} onChange={setClub} />
      {chosen ? (
        <Section title={`${clubInfo(chosen)?.label ?? chosen}: where the shots land`}>
          <OvalSection
            club={chosen}
            groups={analysis.groups}
            shots={shots}
            units={units}
            canDecide={isStaff(me.role)}
            deciding={decide.isPending}
            onDecide={(shotId, decision) => decide.mutate({ shotId, decision })}
          />
          {decide.error ? <AppText tone="danger">{errorMessage(decide.error)}</AppText> : null}
        </Section>
      ) : null}
      <Section title="Groups">
        <SwitchField label="Count strays" hint="Off: shots the stray rules flag are left out of the figures." value={includeStrays} onChange={setIncludeStrays} />
        <GroupTable groups={analysis.groups} units={units} selectedClub={chosen} />
        <AppText variant="caption" tone="muted">{`Means ± standard deviation in ${units === 'imperial' ? 'yards and mph' : 'metres and km/h'}; “Shots” counts the shots in the figures.`}</AppText>
      </Section>
      {builds.length >= 2 && pair ? (
        <Section title="Head-to-head">
          <HeadToHeadSection builds={builds} a={pair[0]} b={pair[1]} onChange={(a, b) => setPair([a, b])} headToHead={h2h.data?.analysis.headToHead} loading={h2h.isFetching} units={units} />
        </Section>
      ) : null}
      {chosen ? (
        <Section title="Launch window">
          <LaunchWindowSection shots={shots.filter((s) => s.club === chosen)} ballSpeedMps={ballSpeed} air={air.normalisedTo ?? air.measured} units={units} club={chosen} />
        </Section>
      ) : null}
      <Section title="Ladder">
        <Card>
          <View onLayout={onLadderLayout}>
            {ladderWidth > 0 && analysis.ladder.length > 0 ? <LadderChart rungs={analysis.ladder} units={units} widthPx={ladderWidth} /> : <AppText tone="muted">No carries to ladder.</AppText>}
          </View>
          <AppText variant="caption" tone="muted">
            {`Median carry of the kept shots per club. Gaps of about ${formatField(9.144, 'carry', units)} to ${formatField(13.716, 'carry', units)} between irons are usual (common practice); tight and wide gaps are marked.`}
          </AppText>
        </Card>
      </Section>
      <Section title="At the player’s course">
        <CourseConditions value={to} onChange={setTo} />
      </Section>
    </View>
  );
}

const styles = StyleSheet.create({ panel: { gap: space.xl } });
