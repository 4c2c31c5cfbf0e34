import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BayFile } from '@/server/schemas';
import { formatDate, plural } from '../format';
import { useDeleteBayFileMutation } from '../queries/bay-files';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ConfirmStep } from '../ui/confirm-step';
import { deleteBayFileQuestion } from './import-words';

type BayFileRowProps = {
  bayFile: BayFile;
  /** Staff may change a file's mapping and delete it. */
  canChange: boolean;
};

/** One bay file of a fitting: its name and counts; for staff, "Change mapping" and "Delete" (confirmed in the page). */
export function BayFileRow({ bayFile, canChange }: BayFileRowProps) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteBayFileMutation();
  const { report } = bayFile;
  const counts = [
    plural(bayFile.shotCount, 'shot'),
    report.rejected.length ? `${plural(report.rejected.length, 'row')} not imported` : null,
    report.skipped.length ? `${report.skipped.length} skipped` : null,
    `added ${formatDate(bayFile.createdAt)}`,
  ]
    .filter(Boolean)
    .join(' · ');
  const cancel = () => {
    setConfirming(false);
    remove.reset();
  };
  return (
    <View style={styles.row}>
      <AppText variant="bodyStrong" numberOfLines={1}>
        {bayFile.fileName}
      </AppText>
      <AppText variant="caption" tone="muted">
        {counts}
      </AppText>
      {canChange && !confirming ? (
        <View style={styles.actions}>
          <Button
            title="Change mapping"
            accessibilityLabel={`Change the mapping of ${bayFile.fileName}`}
            variant="secondary"
            compact
            onPress={() => router.push({ pathname: '/bay-files/[id]/remap', params: { id: bayFile.id } })}
          />
          <Button title="Delete" accessibilityLabel={`Delete ${bayFile.fileName}`} variant="quiet" compact onPress={() => setConfirming(true)} />
        </View>
      ) : null}
      {canChange && confirming ? (
        <ConfirmStep
          question={deleteBayFileQuestion(bayFile.fileName, bayFile.shotCount)}
          confirmTitle="Delete"
          confirmLabel={`Yes, delete ${bayFile.fileName}`}
          onConfirm={() => remove.mutate(bayFile.id)}
          onCancel={cancel}
          busy={remove.isPending}
          error={remove.error}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: 2, paddingVertical: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
});
