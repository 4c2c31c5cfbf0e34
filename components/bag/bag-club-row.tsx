import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { UnitSystem } from '@/analysis/units';
import type { BagClub } from '@/server/schemas';
import { buildSummary } from '../builds/build-summary';
import { formatDate } from '../format';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { clubName, STATUS_WORDS } from './bag-words';
import { carryText } from './carry-text';

type BagClubRowProps = { club: BagClub; units: UnitSystem; playerId: string; readOnly?: boolean };

/** One club of the bag: name, status, specs on one line, carry and its source, date in, wear reminder. */
export function BagClubRow({ club, units, playerId, readOnly = false }: BagClubRowProps) {
  const router = useRouter();
  const summary = buildSummary(club);
  const name = clubName(club.club);
  return (
    <View style={styles.row} testID="bag-club">
      <View style={styles.text}>
        <View style={styles.title}>
          <AppText variant="bodyStrong">{name}</AppText>
          {club.status !== 'in-bag' ? (
            <View style={[styles.tag, club.status === 'out' && styles.tagOut]}>
              <AppText variant="caption">{STATUS_WORDS[club.status]}</AppText>
            </View>
          ) : null}
        </View>
        <AppText tone="muted" style={!summary && styles.none}>{summary ?? 'No specs yet'}</AppText>
        <AppText variant="caption">
          {[clubInfo(club.club)?.kind === 'putter' ? null : `Carry ${carryText(club.carry, units)}`, club.inBagSince ? `in since ${formatDate(club.inBagSince)}` : null].filter(Boolean).join(' · ')}
        </AppText>
        {club.wear ? (
          <AppText variant="caption" style={styles.wear}>
            {`Time to check the grooves: ${club.wear.roundsSince} rounds and ${club.wear.practiceSessionsSince} practice sessions since it went in.`}
          </AppText>
        ) : null}
      </View>
      {readOnly ? null : (
        <Button
          title="Open"
          compact
          variant="secondary"
          accessibilityLabel={`Open the ${name.toLowerCase()}`}
          onPress={() => router.push({ pathname: '/bag-clubs/[id]', params: { id: club.id, playerId } })}
        />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.border },
  text: { flex: 1, minWidth: 0, gap: 2 },
  title: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  tag: { backgroundColor: colors.accentSoft, borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 1 },
  tagOut: { backgroundColor: colors.surfaceSunk },
  none: { fontStyle: 'italic' },
  wear: { color: colors.caution },
});
