import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { CsvLinks } from '../analysis/csv-links';
import { GroupTable } from '../analysis/group-table';
import { ShotTable } from '../analysis/shot-table';
import { useFittingAnalysisQuery } from '../queries/analysis';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Section } from '../ui/section';
import type { FittingPageState } from './use-fitting-page-state';

type ShotsViewProps = { fitting: Fitting; state: FittingPageState };

/** The figures per group and every shot with every field; the exports for staff. */
export function ShotsView({ fitting, state }: ShotsViewProps) {
  const me = useMe();
  const query = useFittingAnalysisQuery(fitting.id, { level: 0.95, includeStrays: state.includeStrays, compare: null, to: state.to, odds: state.odds });
  const clubs = useMemo(() => [...new Set(query.data?.analysis.groups.map((g) => g.club) ?? [])], [query.data]);
  if (query.isPending) return <LoadingState label="Working out the groups…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  return (
    <View style={styles.view}>
      <Section title="Groups">
        <GroupTable groups={query.data.analysis.groups} units={me.units} selectedClub={state.club} />
        <AppText variant="caption" tone="muted">
          {`Means ± standard deviation in ${me.units === 'imperial' ? 'yards and mph' : 'metres and km/h'}${state.to ? ', at the player’s course' : ''}; “Shots” counts the shots in the figures (${state.includeStrays ? 'strays counted' : 'misreads and mishits left out'}). Fairway and green: the next shot’s odds.`}
        </AppText>
      </Section>
      <Section title="Every shot">
        <ShotTable fittingId={fitting.id} clubs={clubs} units={me.units} />
      </Section>
      {isStaff(me.role) ? (
        <Section title="Export">
          <CsvLinks fittingId={fitting.id} />
        </Section>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ view: { gap: space.xl } });
