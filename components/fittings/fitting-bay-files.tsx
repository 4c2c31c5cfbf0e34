import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { formatDate, plural } from '../format';
import { useBayFilesQuery } from '../queries/bay-files';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { Section } from '../ui/section';

type FittingBayFilesProps = { fitting: Fitting };

/** The fitting's bay files with their counts, and the way to import another. */
export function FittingBayFiles({ fitting }: FittingBayFilesProps) {
  const router = useRouter();
  const me = useMe();
  const files = useBayFilesQuery(fitting.id);
  // Staff import into any fitting of the shop; a player only into their own remote fitting.
  const canImport = isStaff(me.role) || fitting.remote;
  const open = () => router.push({ pathname: '/fittings/[id]/import', params: { id: fitting.id } });
  return (
    <Section title="Bay files" action={canImport ? <Button title="Import a bay file" compact onPress={open} /> : null}>
      {files.isPending ? <LoadingState label="Loading bay files…" /> : null}
      {files.isError ? <ErrorState error={files.error} onRetry={() => void files.refetch()} /> : null}
      {files.data && files.data.length === 0 ? <AppText tone="muted">No bay file imported yet.</AppText> : null}
      {files.data && files.data.length > 0 ? (
        <Card>
          {files.data.map((f, i) => (
            <View key={f.id} style={[styles.row, i > 0 && styles.divided]}>
              <AppText variant="bodyStrong" numberOfLines={1}>
                {f.fileName}
              </AppText>
              <AppText variant="caption" tone="muted">
                {[
                  plural(f.shotCount, 'shot'),
                  f.report.rejected.length ? `${plural(f.report.rejected.length, 'row')} not imported` : null,
                  f.report.skipped.length ? `${f.report.skipped.length} skipped` : null,
                  `added ${formatDate(f.createdAt)}`,
                ]
                  .filter(Boolean)
                  .join(' · ')}
              </AppText>
            </View>
          ))}
        </Card>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { gap: 2, paddingVertical: space.xs },
  divided: { borderTopWidth: StyleSheet.hairlineWidth, borderTopColor: colors.border, paddingTop: space.sm },
});
