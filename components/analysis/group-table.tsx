import { ScrollView, StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { ShotField } from '@/analysis/fields';
import type { GroupAnalysis } from '@/analysis/session';
import type { UnitSystem } from '@/analysis/units';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { fieldNumber, MISSING, unitText } from '../format-field';

type GroupTableProps = { groups: readonly GroupAnalysis[]; units: UnitSystem; selectedClub?: string | null };

const COLUMNS: { field: ShotField | 'smash'; title: string }[] = [
  { field: 'clubSpeed', title: 'Club speed' },
  { field: 'ballSpeed', title: 'Ball speed' },
  { field: 'smash', title: 'Smash' },
  { field: 'launchAngle', title: 'Launch' },
  { field: 'spinRate', title: 'Spin' },
  { field: 'spinAxis', title: 'Spin axis' },
  { field: 'carry', title: 'Carry' },
  { field: 'offline', title: 'Offline' },
];

function cell(g: GroupAnalysis, field: ShotField | 'smash', units: UnitSystem): { mean: string; sd: string } {
  const s = field === 'smash' ? g.smashFactor : g.fields[field];
  const f: ShotField = field === 'smash' ? 'smashFactor' : field;
  if (!s) return { mean: MISSING, sd: '' };
  return { mean: fieldNumber(s.mean, f, units), sd: s.sd == null ? '' : `±${fieldNumber(s.sd, f, units)}` };
}

/** Every group (club × build): shots, kept, and the key means ± sd, in the user's units. Scrolls sideways on a phone. */
export function GroupTable({ groups, units, selectedClub }: GroupTableProps) {
  return (
    <ScrollView horizontal showsHorizontalScrollIndicator accessibilityLabel="Groups table">
      <View style={styles.table}>
        <View style={[styles.row, styles.head]}>
          <AppText variant="label" style={[styles.name, styles.headText, styles.left]}>Club · build</AppText>
          <AppText variant="label" style={[styles.num, styles.headText]}>Shots</AppText>
          {COLUMNS.map((c) => (
            <AppText key={c.field} variant="label" style={[styles.num, styles.headText]}>
              {c.title}
              {c.field === 'smash' ? '' : `\n${unitText(c.field, units)}`}
            </AppText>
          ))}
        </View>
        {groups.map((g) => (
          <View key={`${g.club}|${g.build ?? ''}`} style={[styles.row, g.club === selectedClub && styles.selected]}>
            <View style={styles.name}>
              <AppText variant="bodyStrong">{clubInfo(g.club)?.label ?? g.club}</AppText>
              <AppText variant="caption" tone="muted">{g.build ?? 'No build named'}</AppText>
            </View>
            <AppText style={styles.num}>
              {g.kept}
              {g.kept !== g.n ? <AppText variant="caption" tone="muted">{`/${g.n}`}</AppText> : null}
            </AppText>
            {COLUMNS.map((c) => {
              const v = cell(g, c.field, units);
              return (
                <View key={c.field} style={styles.num}>
                  <AppText style={styles.right}>{v.mean}</AppText>
                  <AppText variant="caption" tone="muted" style={styles.right}>{v.sd}</AppText>
                </View>
              );
            })}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  table: { minWidth: '100%' },
  row: { flexDirection: 'row', alignItems: 'center', borderBottomWidth: 1, borderBottomColor: colors.border, paddingVertical: space.sm },
  head: { borderBottomColor: colors.ink },
  headText: { color: colors.textMuted, textAlign: 'right' },
  selected: { backgroundColor: colors.accentSoft },
  name: { width: 150, paddingHorizontal: space.sm, textAlign: 'left' },
  num: { width: 78, paddingHorizontal: space.sm, textAlign: 'right' },
  right: { textAlign: 'right' },
  left: { textAlign: 'left' },
});
