import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { useBuildsQuery } from '../queries/builds';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { ResponsiveGrid } from '../ui/responsive-grid';
import { Section } from '../ui/section';
import { BuildRow } from './build-row';
import { groupBuildsByClub } from './build-summary';

type FittingBuildsProps = { fitting: Fitting };

/** The "Builds" section of a fitting: each head build under test with its specs, by club in bag order. */
export function FittingBuilds({ fitting }: FittingBuildsProps) {
  const me = useMe();
  const builds = useBuildsQuery(fitting.id);
  const staff = isStaff(me.role);
  return (
    <Section title="Builds">
      {builds.isPending ? <LoadingState label="Loading builds…" /> : null}
      {builds.isError ? <ErrorState error={builds.error} onRetry={() => void builds.refetch()} /> : null}
      {builds.data && builds.data.length === 0 ? (
        <AppText tone="muted">Builds appear once a bay file is in: one for each club and build its shots name.</AppText>
      ) : null}
      {builds.data && builds.data.length > 0 ? (
        <ResponsiveGrid>
          {groupBuildsByClub(builds.data).map((group) => (
            <Card key={group.club}>
              <AppText variant="label" tone="muted" accessibilityRole="header">
                {group.clubLabel}
              </AppText>
              {group.builds.map((b, i) => (
                <View key={b.id} style={i > 0 && styles.divided}>
                  <BuildRow build={b} clubLabel={group.clubLabel} canEdit={staff} />
                </View>
              ))}
            </Card>
          ))}
        </ResponsiveGrid>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  divided: { borderTopWidth: StyleSheet.hairlineWidth, borderTopColor: colors.border, paddingTop: space.sm },
});
