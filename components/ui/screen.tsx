import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, layout, space } from '../theme';

type ScreenProps = { children: ReactNode; scroll?: boolean };

/** A page: warm background, content centred and at most ~960 px wide. */
export function Screen({ children, scroll = true }: ScreenProps) {
  const inner = <View style={styles.inner}>{children}</View>;
  if (!scroll) return <View style={styles.page}>{inner}</View>;
  return (
    <ScrollView style={styles.page} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
      {inner}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1 },
  inner: {
    width: '100%',
    maxWidth: layout.maxContentWidthPx,
    alignSelf: 'center',
    padding: space.lg,
    gap: space.lg,
  },
});
