import { ActivityIndicator, Pressable, StyleSheet } from 'react-native';
import { colors, fonts, layout, radius, space } from '../theme';
import { AppText } from './app-text';

type ButtonProps = {
  title: string;
  onPress: () => void;
  variant?: 'primary' | 'secondary' | 'danger' | 'quiet';
  busy?: boolean;
  disabled?: boolean;
  accessibilityLabel?: string;
  /** Shrink to the text instead of filling the row. */
  compact?: boolean;
};

/** A button at least 44 px tall; shows a spinner and ignores presses while busy. */
export function Button({ title, onPress, variant = 'primary', busy = false, disabled = false, accessibilityLabel, compact = false }: ButtonProps) {
  const inactive = disabled || busy;
  const palette = variants[variant];
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? title}
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed, hovered }: { pressed: boolean; hovered?: boolean }) => [
        styles.base,
        compact && styles.compact,
        { backgroundColor: palette.bg, borderColor: palette.border },
        (pressed || hovered) && !inactive && { backgroundColor: palette.bgActive },
        inactive && styles.inactive,
      ]}
    >
      {busy ? <ActivityIndicator color={palette.fg} size="small" /> : null}
      <AppText variant="bodyStrong" style={[styles.text, { color: palette.fg }]}>
        {title}
      </AppText>
    </Pressable>
  );
}

const variants = {
  primary: { bg: colors.ink, bgActive: colors.inkSoft, fg: colors.textOnInk, border: colors.ink },
  secondary: { bg: colors.surface, bgActive: colors.surfaceSunk, fg: colors.ink, border: colors.border },
  danger: { bg: colors.surface, bgActive: colors.dangerSoft, fg: colors.danger, border: colors.danger },
  quiet: { bg: 'transparent', bgActive: colors.surfaceSunk, fg: colors.ink, border: 'transparent' },
} as const;

const styles = StyleSheet.create({
  base: {
    minHeight: layout.minTouchPx,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    borderWidth: 1,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
  },
  compact: { alignSelf: 'flex-start' },
  inactive: { opacity: 0.55 },
  text: { fontFamily: fonts.semibold },
});
