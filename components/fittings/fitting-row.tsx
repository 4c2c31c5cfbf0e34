import { StyleSheet, View } from 'react-native';
import { COURSE_STEP_WORDS, type Fitting } from '@/server/schemas';
import { formatDate, formatVenue, plural } from '../format';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { space } from '../theme';

type FittingRowProps = { fitting: Fitting; onPress: () => void; showPlayer?: boolean };

/** One fitting in a list: date, player, fitter, venue, shot count, its step and unread messages. */
export function FittingRow({ fitting, onPress, showPlayer = true }: FittingRowProps) {
  const title = showPlayer ? fitting.playerName : formatVenue(fitting.venue);
  return (
    <Card onPress={onPress} accessibilityLabel={`Fitting of ${fitting.playerName} on ${formatDate(fitting.date)}`}>
      <View style={styles.top}>
        <AppText variant="bodyStrong" numberOfLines={1} style={styles.title}>
          {title}
        </AppText>
        <AppText variant="label" tone="muted">
          {formatDate(fitting.date)}
        </AppText>
      </View>
      <AppText variant="caption" tone="muted">
        {[
          showPlayer ? formatVenue(fitting.venue) : null,
          fitting.fitterName ? `with ${fitting.fitterName}` : 'no fitter set',
          plural(fitting.shotCount, 'shot'),
          fitting.remote ? 'remote' : null,
          COURSE_STEP_WORDS[fitting.courseStep],
        ]
          .filter(Boolean)
          .join(' · ')}
      </AppText>
      {fitting.unreadMessages > 0 ? (
        <AppText variant="label" tone="accent">
          {plural(fitting.unreadMessages, 'unread message')}
        </AppText>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md },
  title: { flexShrink: 1 },
});
