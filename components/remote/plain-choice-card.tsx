import { StyleSheet, View } from 'react-native';
import type { PlainChoice } from '@/server/schemas';
import { plural } from '../format';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';

type PlainChoiceCardProps = { choice: PlainChoice };

/** One chosen build in the player's words: what it does against the other build, the odds, the curve. */
export function PlainChoiceCard({ choice }: PlainChoiceCardProps) {
  const flight = [choice.curve ? `curves: ${choice.curve}` : null, choice.miss ? `finishes: ${choice.miss}` : null].filter(Boolean).join(' · ');
  return (
    <Card>
      <View style={styles.box}>
        <AppText variant="label" tone="muted">{choice.clubLabel}</AppText>
        <AppText variant="bodyStrong">{choice.headline}</AppText>
        {choice.against ? <AppText tone="muted">{choice.against}{choice.certainty === 'not-yet' ? ' — a few more shots would make this surer.' : '.'}</AppText> : null}
        {choice.odds ? <AppText>{choice.odds}</AppText> : null}
        {flight ? <AppText variant="caption" tone="muted">{`${flight} (${plural(choice.shots, 'shot')})`}</AppText> : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ box: { gap: space.xs } });
