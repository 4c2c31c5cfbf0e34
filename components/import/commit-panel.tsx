import { StyleSheet, View } from 'react-native';
import { ApiError, errorMessage } from '../api-client';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { ProgressBar } from '../ui/progress-bar';
import { importErrorTitle } from './import-words';
import type { CommitPhase } from './use-import-session';

type CommitPanelProps = {
  /** The button's words ("Import 48 shots", "Apply the new mapping") and its accessible name. */
  title: string;
  accessibilityLabel: string;
  /** Upload progress (an import); a re-map sends no file and shows only the busy button. */
  phase?: CommitPhase;
  error: unknown;
  busy: boolean;
  /** Why the import cannot start now, or null. */
  blocker: string | null;
  onCommit: () => void;
};

/** The import (or apply) button, its progress (upload, then processing) and its error in the page. */
export function CommitPanel({ title, accessibilityLabel, phase = { kind: 'idle' }, error, busy, blocker, onCommit }: CommitPanelProps) {
  const code = error instanceof ApiError ? error.code : undefined;
  return (
    <View style={styles.box}>
      {error ? (
        <Notice tone="danger" title={importErrorTitle(code)}>
          {errorMessage(error)}
        </Notice>
      ) : null}
      {phase.kind === 'uploading' ? (
        <View style={styles.progress}>
          <AppText variant="caption" tone="muted">
            {phase.fraction === null ? 'Sending the file…' : `Sending the file… ${Math.round(phase.fraction * 100)} %`}
          </AppText>
          <ProgressBar fraction={phase.fraction} label="Sending the file" />
        </View>
      ) : null}
      {phase.kind === 'processing' ? (
        <View style={styles.progress}>
          <AppText variant="caption" tone="muted">
            Reading and storing the shots…
          </AppText>
          <ProgressBar fraction={null} label="Reading and storing the shots" />
        </View>
      ) : null}
      {blocker ? <AppText tone="muted">{blocker}</AppText> : null}
      <Button
        title={title}
        accessibilityLabel={accessibilityLabel}
        onPress={onCommit}
        busy={busy}
        disabled={blocker !== null}
      />
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.md }, progress: { gap: space.xs } });
