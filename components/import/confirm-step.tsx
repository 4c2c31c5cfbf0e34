import { StyleSheet, View } from 'react-native';
import { errorMessage } from '../api-client';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';

type ConfirmStepProps = {
  /** The question, naming what goes and what follows ("Delete x.csv? Its 48 shots leave the analysis."). */
  question: string;
  /** The confirming button's words and its accessible name. */
  confirmTitle: string;
  confirmLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy: boolean;
  /** The last attempt's error, shown in the page. */
  error: unknown;
};

/** An in-page confirmation before something is deleted: the question, then Delete / Cancel. */
export function ConfirmStep({ question, confirmTitle, confirmLabel, onConfirm, onCancel, busy, error }: ConfirmStepProps) {
  return (
    <View style={styles.box}>
      <Notice tone="caution">
        <AppText>{question}</AppText>
      </Notice>
      {error ? (
        <Notice tone="danger" title="Not deleted">
          {errorMessage(error)}
        </Notice>
      ) : null}
      <View style={styles.actions}>
        <Button title={confirmTitle} accessibilityLabel={confirmLabel} variant="danger" compact busy={busy} onPress={onConfirm} />
        <Button title="Cancel" variant="secondary" compact disabled={busy} onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
