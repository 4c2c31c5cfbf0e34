import { ScrollView, StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { Shot } from '@/analysis/fields';
import type { UnitSystem } from '@/analysis/units';
import { plural } from '../format';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import { formatShotValue, previewColumns } from './shot-columns';

type PreviewShotsProps = { shots: readonly Shot[]; total: number; units: UnitSystem };

const WIDTH = { row: 44, club: 52, build: 84, value: 70 } as const;

/** The first converted shots as a compact table (scrolls sideways on a phone). */
export function PreviewShots({ shots, total, units }: PreviewShotsProps) {
  const columns = previewColumns(shots, units);
  if (shots.length === 0) return <AppText tone="muted">No row of this file converts to a shot with this mapping.</AppText>;
  const cell = (text: string, width: number, key: string, strong = false, right = false) => (
    <AppText key={key} variant={strong ? 'label' : 'caption'} numberOfLines={strong ? 3 : 1} style={[styles.cell, { width }, right && styles.right]}>
      {text}
    </AppText>
  );
  return (
    <View style={styles.box}>
      <AppText variant="caption" tone="muted">
        {shots.length < total ? `The first ${shots.length} of ${plural(total, 'shot')}.` : `${plural(total, 'shot')}.`}
      </AppText>
      <ScrollView horizontal accessibilityLabel="Converted shots">
        <View accessibilityRole={'table' as never}>
          <View style={[styles.line, styles.headLine]}>
            {cell('Row', WIDTH.row, 'row', true)}
            {cell('Club', WIDTH.club, 'club', true)}
            {cell('Build', WIDTH.build, 'build', true)}
            {columns.map((c) => cell(c.unit ? `${c.title}\n${c.unit}` : c.title, WIDTH.value, c.field, true, true))}
          </View>
          {shots.map((s) => (
            <View key={s.row} style={styles.line}>
              {cell(String(s.row), WIDTH.row, 'row')}
              {cell(s.club, WIDTH.club, 'club')}
              {cell(s.build ?? '–', WIDTH.build, 'build')}
              {columns.map((c) =>
                cell(formatShotValue(s, c.field, units) + (s.derived.includes(c.field) ? '*' : ''), WIDTH.value, c.field, false, true),
              )}
            </View>
          ))}
        </View>
      </ScrollView>
      {shots.some((s) => columns.some((c) => s.derived.includes(c.field))) ? (
        <AppText variant="caption" tone="muted">
          * computed, not in the file.
          {shots.some((s) => clubInfo(s.club)?.kind === 'wedge' && s.derived.length > 0)
            ? ' Wedge values computed by the ball-flight model are the least certain: slow, high flights meet the drag crisis, where balls differ most.'
            : ''}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.border, padding: space.sm },
  line: { flexDirection: 'row', borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.border, paddingVertical: 6 },
  headLine: { borderBottomColor: colors.ink, borderBottomWidth: 1, alignItems: 'flex-end' },
  cell: { paddingHorizontal: 4 },
  right: { textAlign: 'right' },
});
