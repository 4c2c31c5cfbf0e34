import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '../theme';
import { AppText } from './app-text';

type SwitchFieldProps = { label: string; hint?: string; value: boolean; onChange: (value: boolean) => void; disabled?: boolean };

/**
 * A yes/no setting with a label and a short explanation. The whole row is the control (at least
 * 44 px tall), so the label is as good a target as the drawn switch.
 */
export function SwitchField({ label, hint, value, onChange, disabled = false }: SwitchFieldProps) {
  return (
    <Pressable
      accessibilityRole="switch"
      accessibilityLabel={label}
      aria-checked={value}
      aria-disabled={disabled}
      disabled={disabled}
      onPress={() => onChange(!value)}
      style={[styles.row, disabled && styles.disabled]}
    >
      <View style={styles.text}>
        <AppText variant="label">{label}</AppText>
        {hint ? (
          <AppText variant="caption" tone="muted">
            {hint}
          </AppText>
        ) : null}
      </View>
      <View style={[styles.track, value && styles.trackOn]}>
        <View style={[styles.thumb, value && styles.thumbOn]} />
      </View>
    </Pressable>
  );
}

const TRACK = { width: 48, height: 28 } as const;
const THUMB = 22;

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: layout.minTouchPx,
    paddingVertical: space.xs,
  },
  disabled: { opacity: 0.55 },
  text: { flex: 1, gap: 2 },
  track: {
    width: TRACK.width,
    height: TRACK.height,
    borderRadius: radius.pill,
    backgroundColor: colors.border,
    padding: (TRACK.height - THUMB) / 2,
    justifyContent: 'center',
  },
  trackOn: { backgroundColor: colors.ink },
  thumb: { width: THUMB, height: THUMB, borderRadius: radius.pill, backgroundColor: colors.surface },
  thumbOn: { alignSelf: 'flex-end' },
});
