import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '../theme';

type CardProps = {
  children: ReactNode;
  /** Makes the whole card a link-like button. */
  onPress?: () => void;
  accessibilityLabel?: string;
};

/** A white panel on the page; pressable when it leads somewhere. */
export function Card({ children, onPress, accessibilityLabel }: CardProps) {
  if (!onPress) return <View style={styles.card}>{children}</View>;
  return (
    <Pressable
      accessibilityRole="link"
      accessibilityLabel={accessibilityLabel}
      onPress={onPress}
      style={({ pressed, hovered }: { pressed: boolean; hovered?: boolean }) => [
        styles.card,
        styles.pressable,
        (pressed || hovered) && styles.active,
      ]}
    >
      {children}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: space.lg,
    gap: space.sm,
  },
  pressable: { minHeight: layout.minTouchPx },
  active: { borderColor: colors.accent, backgroundColor: '#FFFCF7' },
});
