import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { BayFileRow } from '../import/bay-file-row';
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

/** The fitting's bay files with their counts, the way to import another, and (staff) to re-map or delete one. */
export function FittingBayFiles({ fitting }: FittingBayFilesProps) {
  const router = useRouter();
  const me = useMe();
  const files = useBayFilesQuery(fitting.id);
  const staff = isStaff(me.role);
  // Staff import into any fitting of the shop; a player only into their own remote fitting.
  const canImport = staff || fitting.remote;
  const open = () => router.push({ pathname: '/fittings/[id]/import', params: { id: fitting.id } });
  return (
    <Section title="Bay files" action={canImport ? <Button title="Import a bay file" compact onPress={open} /> : null}>
      {files.isPending ? <LoadingState label="Loading bay files…" /> : null}
      {files.isError ? <ErrorState error={files.error} onRetry={() => void files.refetch()} /> : null}
      {files.data && files.data.length === 0 ? <AppText tone="muted">No bay file imported yet.</AppText> : null}
      {files.data && files.data.length > 0 ? (
        <Card>
          {files.data.map((f, i) => (
            <View key={f.id} style={i > 0 && styles.divided}>
              <BayFileRow bayFile={f} canChange={staff} />
            </View>
          ))}
        </Card>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  divided: { borderTopWidth: StyleSheet.hairlineWidth, borderTopColor: colors.border, paddingTop: space.sm },
});
