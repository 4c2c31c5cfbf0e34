import { useRouter } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { colors, layout } from '../theme';

/**
 * The header's way back for a page opened by its address (a link sent to a player, a reload):
 * with no history to go back to, it leads to the start page of the signed-in user.
 */
export function HeaderHomeButton() {
  const router = useRouter();
  return (
    <Pressable accessibilityRole="button" accessibilityLabel="Back to the start page" onPress={() => router.replace('/')} style={styles.button}>
      <Svg width={24} height={24} viewBox="0 0 24 24">
        <Path d="M15 5 L8 12 L15 19" stroke={colors.textOnInk} strokeWidth={2.2} fill="none" strokeLinecap="round" strokeLinejoin="round" />
      </Svg>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: { minWidth: layout.minTouchPx, minHeight: layout.minTouchPx, alignItems: 'center', justifyContent: 'center', marginLeft: 4 },
});
