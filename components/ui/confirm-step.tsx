import { StyleSheet, View } from 'react-native';
import { errorMessage } from '../api-client';
import { space } from '../theme';
import { AppText } from './app-text';
import { Button } from './button';
import { Notice } from './notice';

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
  /** The error's title ("Not deleted", "Not deactivated"). */
  errorTitle?: string;
};

/**
 * An in-page confirmation before something that is hard to undo (a delete, a deactivation): the
 * question, then the confirming button and Cancel. Alert.alert does nothing on the web.
 */
export function ConfirmStep({ question, confirmTitle, confirmLabel, onConfirm, onCancel, busy, error, errorTitle = 'Not deleted' }: ConfirmStepProps) {
  return (
    <View style={styles.box}>
      <Notice tone="caution">
        <AppText>{question}</AppText>
      </Notice>
      {error ? (
        <Notice tone="danger" title={errorTitle}>
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
