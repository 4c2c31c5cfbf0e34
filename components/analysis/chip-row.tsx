import { Pressable, ScrollView, StyleSheet } from 'react-native';
import { colors, layout, radius, space } from '../theme';
import { AppText } from '../ui/app-text';

type ChipRowProps<T extends string> = {
  label: string;
  value: T | null;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
};

/** A scrollable row of choices (clubs, builds); one is selected. */
export function ChipRow<T extends string>({ label, value, options, onChange }: ChipRowProps<T>) {
  return (
    <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row} accessibilityRole="radiogroup" accessibilityLabel={label}>
      {options.map((o) => {
        const selected = o.value === value;
        return (
          <Pressable
            key={o.value}
            accessibilityRole="radio"
            aria-checked={selected}
            accessibilityLabel={o.label}
            onPress={() => onChange(o.value)}
            style={[styles.chip, selected && styles.selected]}
          >
            <AppText variant="label" style={{ color: selected ? colors.textOnInk : colors.ink }}>
              {o.label}
            </AppText>
          </Pressable>
        );
      })}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: 2 },
  chip: {
    minHeight: layout.minTouchPx,
    minWidth: layout.minTouchPx,
    paddingHorizontal: space.lg,
    borderRadius: radius.pill,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  selected: { backgroundColor: colors.ink, borderColor: colors.ink },
});
