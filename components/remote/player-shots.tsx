import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import { oddsInPlainWords } from '@/analysis/plain-words/odds-in-plain-words';
import type { Fitting } from '@/server/schemas';
import { ChipRow } from '../analysis/chip-row';
import { OvalSection } from '../analysis/oval-section';
import { analysisShots } from '../analysis/plot-shots';
import { StrayList } from '../analysis/stray-list';
import { useFittingAnalysisQuery } from '../queries/analysis';
import type { UnitSystem } from '@/analysis/units';
import type { Hand } from '@/analysis/plain-words/handed-words';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Section } from '../ui/section';

type PlayerShotsProps = { fitting: Fitting; units: UnitSystem; hand?: Hand };

const noDecision = () => {};

/**
 * The player's shots per club: their ovals and on-target odds in words; the statistics (strays
 * and their reasons, the methods) only once they open "how we worked this out".
 */
export function PlayerShots({ fitting, units, hand }: PlayerShotsProps) {
  const query = useFittingAnalysisQuery(fitting.id, { level: 0.95, includeStrays: false, compare: null, to: null, odds: null });
  const [club, setClub] = useState<string | null>(null);
  const [how, setHow] = useState(false);
  const data = query.data;
  const clubs = useMemo(() => [...new Set(data?.analysis.groups.map((g) => g.club) ?? [])], [data]);
  const shots = useMemo(() => (data ? analysisShots(data) : []), [data]);
  if (query.isPending) return <LoadingState label="Loading your shots…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const current = club && clubs.includes(club) ? club : (clubs[0] ?? null);
  if (!current) return null;
  const groups = query.data.analysis.groups.filter((g) => g.club === current);
  return (
    <Section title="Where your shots land">
      <ChipRow label="Club" value={current} options={clubs.map((c) => ({ value: c, label: clubInfo(c)?.label ?? c }))} onChange={setClub} />
      <OvalSection club={current} groups={query.data.analysis.groups} shots={shots} units={units} canDecide={false} deciding={false} onDecide={noDecision} showStrays={false} hand={hand} />
      {groups.map((g) => {
        const o = g.odds;
        if (o.fairway.p === null || o.green.p === null) return null;
        const words = oddsInPlainWords({ fairwayWidthM: o.fairway.widthM, fairway: o.fairway.p, greenRadiusM: o.green.radiusM, green: o.green.p }, units);
        return <AppText key={g.build ?? ''}>{`${g.build ?? clubInfo(current)?.label ?? current}: ${words}`}</AppText>;
      })}
      <Button compact variant="quiet" title={how ? 'Hide how we worked this out' : 'How we worked this out'} onPress={() => setHow(!how)} />
      {how ? (
        <View style={styles.how}>
          <AppText variant="caption" tone="muted">
            Each oval holds about 95% of a build’s shots on the ground; the dashed next-shot ovals widen for few shots (Hotelling’s T² with an F quantile). Two builds are compared with Welch’s t interval on each measure, against the smallest difference your fitter cares about; spread with the Brown–Forsythe test. Shots struck clearly worse than your normal ones are set aside by robust rules (a modified z-score on smash factor and distance, a robust distance on the ground) and listed here with the reason. The odds come from the next-shot distribution of each build.
          </AppText>
          <StrayList groups={groups} shots={shots.filter((s) => s.club === current)} canDecide={false} onDecide={noDecision} deciding={false} />
        </View>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({ how: { gap: space.md } });
