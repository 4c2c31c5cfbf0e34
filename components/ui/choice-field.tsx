import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '../theme';
import { AppText } from './app-text';

type ChoiceFieldProps<T extends string> = {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  disabled?: boolean;
};

/** One of a few options, shown side by side (a radio group). */
export function ChoiceField<T extends string>({ label, value, options, onChange, disabled = false }: ChoiceFieldProps<T>) {
  return (
    <View style={styles.field}>
      <AppText variant="label">{label}</AppText>
      <View style={styles.row} accessibilityRole="radiogroup" accessibilityLabel={label}>
        {options.map((o) => {
          const selected = o.value === value;
          return (
            <Pressable
              key={o.value}
              accessibilityRole="radio"
              aria-checked={selected}
              aria-disabled={disabled}
              accessibilityLabel={o.label}
              disabled={disabled}
              onPress={() => onChange(o.value)}
              style={[styles.option, selected && styles.selected, disabled && styles.disabled]}
            >
              <AppText variant="bodyStrong" style={{ color: selected ? colors.textOnInk : colors.ink }}>
                {o.label}
              </AppText>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  option: {
    minHeight: layout.minTouchPx,
    minWidth: layout.minTouchPx,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  selected: { backgroundColor: colors.ink, borderColor: colors.ink },
  disabled: { opacity: 0.55 },
});
