import { StyleSheet, View } from 'react-native';
import { ladderTextRows } from '@/analysis/bag';
import type { BagLadderRung } from '@/analysis/ladder';
import type { UnitSystem } from '@/analysis/units';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { chartLabel } from './bag-words';

type BagLadderTableProps = { ladder: readonly BagLadderRung[]; units: UnitSystem; labels?: Readonly<Record<string, string>> };

/** The ladder in words: club, loft, carry and where it comes from, the gap and loft step to the next club. */
export function BagLadderTable({ ladder, units, labels }: BagLadderTableProps) {
  const names = labels ?? Object.fromEntries(ladder.map((r) => [r.id, chartLabel(r.club, r.loftDeg)]));
  const rows = ladderTextRows(ladder, names, units);
  return (
    <View style={styles.table} accessibilityRole="list">
      {rows.map((r) => (
        <View key={r.id} style={styles.row} accessibilityRole="none">
          <AppText variant="bodyStrong" style={styles.club}>{r.club}</AppText>
          <AppText style={styles.cell}>{`${r.loft} · ${r.carry} (${r.from})`}</AppText>
          {r.gap ? (
            <AppText style={[styles.cell, r.flagged && styles.flagged]}>{`Gap to next ${r.gap}${r.loftStep ? `, loft step ${r.loftStep}` : ''}`}</AppText>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { gap: 0 },
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: 2, paddingVertical: space.xs, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.border },
  club: { minWidth: 120 },
  cell: { flexShrink: 1 },
  flagged: { color: colors.caution, fontFamily: 'Inter_600SemiBold' },
});
