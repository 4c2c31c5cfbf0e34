import { StyleSheet, View } from 'react-native';
import type { UnitSystem } from '@/analysis/units';
import type { BayFile } from '@/server/schemas';
import { plural } from '../format';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { CommitPanel } from './commit-panel';
import { ImportResult } from './import-result';
import { mappingBlocker } from './mapping-blocker';
import { MappingReview } from './mapping-review';
import { useRemapSession } from './use-remap-session';

type RemapFlowProps = {
  bayFile: BayFile;
  units: UnitSystem;
  onDone: () => void;
};

/** The mapping step for a stored bay file, from its stored mapping; applying it replaces the file's shots. */
export function RemapFlow({ bayFile, units, onDone }: RemapFlowProps) {
  const session = useRemapSession(bayFile);
  const { shown, text, applied, before } = session;
  if (applied) {
    return (
      <ImportResult
        bayFile={applied}
        title="New mapping applied"
        note={`Before: ${plural(before.shotCount, 'shot')}. Keep and drop choices stay with their rows.`}
        onDone={onDone}
        another={{ title: 'Change it again', onPress: session.again }}
      />
    );
  }
  const shotCount = shown?.report.imported ?? 0;
  const blocker = mappingBlocker({
    hasPreview: shown !== undefined,
    noPreview: 'Reading the stored file…',
    duplicate: false,
    buildsComplete: session.buildsComplete,
    openQuestions: session.signQuestions.length,
    previewFailed: session.preview.isError,
    previewBehind: session.previewBehind,
    shotCount,
  });
  return (
    <View style={styles.flow}>
      <AppText tone="muted">
        {`Stored now: ${plural(before.shotCount, 'shot')} from ${plural(before.rowCount, 'row')}. The stored file is read again with the mapping below; its shots are replaced only when you apply it.`}
      </AppText>
      {text.isPending ? <LoadingState label="Loading the stored file…" /> : null}
      {text.isError ? <ErrorState error={text.error} onRetry={() => void text.refetch()} title="The stored file did not load" /> : null}
      <MappingReview session={session} units={units} hasFile={text.data !== undefined} showDuplicate={false} base={bayFile.recipe} />
      {shown ? (
        <CommitPanel
          title="Apply the new mapping"
          accessibilityLabel="Apply the new mapping"
          error={session.error}
          busy={session.busy}
          blocker={blocker}
          onCommit={session.apply}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ flow: { gap: space.xl } });
