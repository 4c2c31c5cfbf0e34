import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '../theme';
import { AppText } from './app-text';

type SegmentedControlProps<T extends string> = {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
};

/** A row of equal segments, one chosen (the views of a page); every segment at least 44 px tall. */
export function SegmentedControl<T extends string>({ label, value, options, onChange }: SegmentedControlProps<T>) {
  return (
    <View style={styles.row} accessibilityRole="tablist" accessibilityLabel={label}>
      {options.map((o) => {
        const selected = o.value === value;
        return (
          <Pressable
            key={o.value}
            accessibilityRole="tab"
            aria-selected={selected}
            accessibilityLabel={o.label}
            onPress={() => onChange(o.value)}
            style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [styles.segment, selected && styles.selected, hovered && !selected && styles.hovered]}
          >
            <AppText variant="label" numberOfLines={1} style={{ color: selected ? colors.textOnInk : colors.ink }}>
              {o.label}
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', backgroundColor: colors.surfaceSunk, borderRadius: radius.md, padding: 3, gap: 3 },
  segment: {
    flex: 1,
    minWidth: 0,
    minHeight: layout.minTouchPx,
    borderRadius: radius.sm,
    alignItems: 'center',
    justifyContent: 'center',
    paddingHorizontal: space.xs,
  },
  selected: { backgroundColor: colors.ink },
  hovered: { backgroundColor: colors.surface },
});
