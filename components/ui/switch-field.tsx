import { StyleSheet, Switch, View } from 'react-native';
import { colors, layout, space } from '../theme';
import { AppText } from './app-text';

type SwitchFieldProps = { label: string; hint?: string; value: boolean; onChange: (value: boolean) => void };

/** A yes/no setting with a label and a short explanation. */
export function SwitchField({ label, hint, value, onChange }: SwitchFieldProps) {
  return (
    <View style={styles.row}>
      <View style={styles.text}>
        <AppText variant="label">{label}</AppText>
        {hint ? (
          <AppText variant="caption" tone="muted">
            {hint}
          </AppText>
        ) : null}
      </View>
      <Switch
        accessibilityLabel={label}
        value={value}
        onValueChange={onChange}
        trackColor={{ false: colors.border, true: colors.ink }}
        thumbColor={colors.surface}
        {...({ activeThumbColor: colors.surface } as object)}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: layout.minTouchPx },
  text: { flex: 1, gap: 2 },
});
