import { StyleSheet, View } from 'react-native';
import type { Player } from '@/server/schemas';
import { formatHandedness, formatHandicap, plural } from '../format';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { colors, radius, space } from '../theme';

type PlayerRowProps = { player: Player; onPress: () => void };

/** One player in a list: name, handicap, handedness, number of fittings. */
export function PlayerRow({ player, onPress }: PlayerRowProps) {
  const fittings = player.fittingCount ?? 0;
  return (
    <Card onPress={onPress} accessibilityLabel={`${player.name}, ${player.handicap === null ? 'no handicap' : `handicap ${formatHandicap(player.handicap)}`}`}>
      <View style={styles.top}>
        <AppText variant="bodyStrong" style={styles.name} numberOfLines={1}>
          {player.name}
        </AppText>
        <View style={styles.badge}>
          {player.handicap === null ? (
            <AppText variant="caption" style={styles.badgeText}>
              No handicap
            </AppText>
          ) : (
            <>
              <AppText variant="caption" style={styles.badgeText}>
                Handicap
              </AppText>
              <AppText variant="label" style={styles.badgeText}>
                {formatHandicap(player.handicap)}
              </AppText>
            </>
          )}
        </View>
      </View>
      <AppText variant="caption" tone="muted">
        {formatHandedness(player.handedness)} · {plural(fittings, 'fitting')}
        {player.hasAccount ? ' · has a sign-in' : ''}
      </AppText>
    </Card>
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md },
  name: { flexShrink: 1 },
  badge: { flexDirection: 'row', alignItems: 'baseline', gap: space.xs, backgroundColor: colors.accentSoft, borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 2 },
  badgeText: { color: colors.ink },
});
