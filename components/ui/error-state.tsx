import { StyleSheet, View } from 'react-native';
import { ApiError, errorMessage } from '../api-client';
import { space } from '../theme';
import { Button } from './button';
import { Notice } from './notice';

type ErrorStateProps = { error: unknown; onRetry?: () => void; title?: string };

function titleFor(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Something went wrong';
  switch (error.code) {
    case 'NOT_FOUND':
      return 'Not found';
    case 'FORBIDDEN':
      return 'Not yours to see';
    case 'NETWORK':
      return 'No connection';
    default:
      return 'Something went wrong';
  }
}

/** The server's message in the page, with a retry button where retrying can help. */
export function ErrorState({ error, onRetry, title }: ErrorStateProps) {
  const final = error instanceof ApiError && (error.code === 'NOT_FOUND' || error.code === 'FORBIDDEN');
  return (
    <View style={styles.box}>
      <Notice tone="danger" title={title ?? titleFor(error)}>
        {errorMessage(error)}
      </Notice>
      {onRetry && !final ? <Button title="Try again" variant="secondary" compact onPress={onRetry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.md } });
