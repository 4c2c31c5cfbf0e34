import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '../theme';
import { AppText } from './app-text';

type EmptyStateProps = { title: string; message?: string; action?: ReactNode };

/** What a list shows when it has nothing, and what to do about it. */
export function EmptyState({ title, message, action }: EmptyStateProps) {
  return (
    <View style={styles.box}>
      <AppText variant="heading">{title}</AppText>
      {message ? (
        <AppText tone="muted" style={styles.message}>
          {message}
        </AppText>
      ) : null}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    padding: space.xl,
    gap: space.md,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: colors.border,
  },
  message: { textAlign: 'center', maxWidth: 420 },
});
