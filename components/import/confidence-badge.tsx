import { StyleSheet, View } from 'react-native';
import { colors, fonts, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import { confidenceLevel } from './recipe-edit';

type ConfidenceBadgeProps = {
  confidence: number;
  /** Who chose this reading instead of the suggestion ("Your choice", "As stored"); shown instead. */
  chosenBy?: string;
  /** Draw `chosenBy` in the caution colours (a question the fitter has to answer). */
  attention?: boolean;
};

const LOOK = {
  high: { text: 'Sure', bg: colors.successSoft, fg: colors.success },
  medium: { text: 'Likely', bg: colors.surfaceSunk, fg: colors.ink },
  low: { text: 'Guess: check', bg: colors.cautionSoft, fg: colors.caution },
} as const;

/** How sure the automatic mapping of a column is; a low one stands out. Who chose it, once not the suggestion. */
export function ConfidenceBadge({ confidence, chosenBy, attention = false }: ConfidenceBadgeProps) {
  const look = chosenBy
    ? { text: chosenBy, bg: attention ? colors.cautionSoft : colors.accentSoft, fg: attention ? colors.caution : colors.ink }
    : LOOK[confidenceLevel(confidence)];
  return (
    <View style={[styles.badge, { backgroundColor: look.bg }]} accessibilityLabel={`${look.text} (${Math.round(confidence * 100)} %)`}>
      <AppText variant="caption" style={{ color: look.fg, fontFamily: fonts.semibold }}>
        {look.text}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 2, alignSelf: 'flex-start' },
});
