import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, space } from '../theme';
import { AppText } from './app-text';

type LoadingStateProps = { label?: string };

/** A spinner with a line saying what is loading. */
export function LoadingState({ label = 'Loading…' }: LoadingStateProps) {
  return (
    <View style={styles.box} accessibilityRole="progressbar" accessibilityLabel={label}>
      <ActivityIndicator color={colors.ink} />
      <AppText tone="muted">{label}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', justifyContent: 'center', padding: space.xxl, gap: space.md },
});
