import { Pressable, StyleSheet, Switch, View } from 'react-native';
import { colors, layout, space } from '../theme';
import { AppText } from './app-text';

type SwitchFieldProps = { label: string; hint?: string; value: boolean; onChange: (value: boolean) => void };

/**
 * A yes/no setting with a label and a short explanation. The whole row is the touch target
 * (at least 44 px tall), not only the small switch.
 */
export function SwitchField({ label, hint, value, onChange }: SwitchFieldProps) {
  return (
    <Pressable accessibilityRole="switch" aria-checked={value} accessibilityLabel={label} onPress={() => onChange(!value)} style={styles.row}>
      <View style={styles.text}>
        <AppText variant="label">{label}</AppText>
        {hint ? (
          <AppText variant="caption" tone="muted">
            {hint}
          </AppText>
        ) : null}
      </View>
      <View pointerEvents="none" importantForAccessibility="no-hide-descendants" aria-hidden>
        <Switch
          value={value}
          trackColor={{ false: colors.border, true: colors.ink }}
          thumbColor={colors.surface}
          {...({ activeThumbColor: colors.surface, tabIndex: -1 } as object)}
        />
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: layout.minTouchPx },
  text: { flex: 1, gap: 2 },
});
