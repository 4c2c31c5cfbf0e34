import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { errorMessage } from '../api-client';
import { space } from '../theme';
import { AppText } from './app-text';
import { Button } from './button';
import { ConfirmStep } from './confirm-step';

type ArchiveDeleteActionsProps = {
  /** What it is, in the buttons' accessible names ("Nell Tarrant", "this fitting"). */
  what: string;
  archived: boolean;
  onArchive: (archived: boolean) => void;
  archiveBusy: boolean;
  archiveError: unknown;
  /** The question before deleting, naming what goes with it. */
  deleteQuestion: string;
  onDelete: () => void;
  deleteBusy: boolean;
  deleteError: unknown;
};

/** Archive (or bring back) and delete, the delete asked once in the page. */
export function ArchiveDeleteActions(props: ArchiveDeleteActionsProps) {
  const [asking, setAsking] = useState(false);
  return (
    <View style={styles.box}>
      {props.archived ? <AppText tone="muted">Archived: hidden from lists unless “Show archived” is on.</AppText> : null}
      {props.archiveError ? <AppText tone="danger">{errorMessage(props.archiveError)}</AppText> : null}
      {asking ? (
        <ConfirmStep
          question={props.deleteQuestion}
          confirmTitle="Delete for good"
          confirmLabel={`Delete ${props.what} for good`}
          onConfirm={props.onDelete}
          onCancel={() => setAsking(false)}
          busy={props.deleteBusy}
          error={props.deleteError}
        />
      ) : (
        <View style={styles.actions}>
          <Button
            title={props.archived ? 'Bring back' : 'Archive'}
            variant="secondary"
            compact
            busy={props.archiveBusy}
            onPress={() => props.onArchive(!props.archived)}
            accessibilityLabel={`${props.archived ? 'Bring back' : 'Archive'} ${props.what}`}
          />
          <Button title="Delete" variant="quiet" compact onPress={() => setAsking(true)} accessibilityLabel={`Delete ${props.what}`} />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
