import { Pressable, StyleSheet } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { colors, layout } from '../theme';

type HeaderBackButtonProps = { label: string; onPress: () => void };

/** The header's back control: one chevron on every page, a 44 px target. */
export function HeaderBackButton({ label, onPress }: HeaderBackButtonProps) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={label}
      onPress={onPress}
      style={({ pressed, hovered }: { pressed: boolean; hovered?: boolean }) => [styles.button, (pressed || hovered) && styles.active]}
    >
      <Svg width={24} height={24} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
        <Path d="M15 5 L8 12 L15 19" stroke={colors.textOnInk} strokeWidth={2.2} fill="none" strokeLinecap="round" strokeLinejoin="round" />
      </Svg>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: { width: layout.minTouchPx, height: layout.minTouchPx, borderRadius: layout.minTouchPx / 2, alignItems: 'center', justifyContent: 'center' },
  active: { backgroundColor: colors.inkSoft },
});
