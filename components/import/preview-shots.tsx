import { useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { Shot } from '@/analysis/fields';
import type { UnitSystem } from '@/analysis/units';
import { plural } from '../format';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import { formatShotValue, previewColumns } from './shot-columns';

type PreviewShotsProps = { shots: readonly Shot[]; total: number; units: UnitSystem };

const WIDTH = { row: 42, club: 100, build: 104, value: 80 } as const;
const HEAD_PX = 60;
const LINE_PX = 30;

/**
 * The first converted shots as a compact table: row and club stay pinned on the left while the
 * fields and the build scroll sideways (with a hint when they do not fit), full club names,
 * left/right values with their side letter.
 */
export function PreviewShots({ shots, total, units }: PreviewShotsProps) {
  const columns = previewColumns(shots, units);
  const [viewPx, setViewPx] = useState(0);
  const [contentPx, setContentPx] = useState(0);
  if (shots.length === 0) return <AppText tone="muted">No row of this file converts to a shot with this mapping.</AppText>;
  const cell = (text: string, width: number, key: string, head = false, right = false) => (
    <View key={key} style={[styles.cell, { width, height: head ? HEAD_PX : LINE_PX }, head && styles.headCell]}>
      <AppText variant={head ? 'label' : 'caption'} numberOfLines={head ? 3 : 1} style={right && styles.right}>
        {text}
      </AppText>
    </View>
  );
  const lineStyle = (head: boolean) => [styles.line, head && styles.headLine];
  const scrolls = contentPx > viewPx + 1 && viewPx > 0;
  return (
    <View style={styles.box}>
      <AppText variant="caption" tone="muted">
        {shots.length < total ? `The first ${shots.length} of ${plural(total, 'shot')}.` : `${plural(total, 'shot')}.`}
        {scrolls ? ' Scroll the table sideways for every field.' : ''}
      </AppText>
      <View style={styles.table} accessibilityRole={'table' as never} accessibilityLabel="Converted shots">
        <View style={styles.pinned}>
          <View style={lineStyle(true)}>
            {cell('Row', WIDTH.row, 'row', true)}
            {cell('Club', WIDTH.club, 'club', true)}
          </View>
          {shots.map((s) => (
            <View key={s.row} style={lineStyle(false)}>
              {cell(String(s.row), WIDTH.row, 'row')}
              {cell(clubInfo(s.club)?.label ?? s.club, WIDTH.club, 'club')}
            </View>
          ))}
        </View>
        <ScrollView
          horizontal
          style={styles.scroll}
          onLayout={(e) => setViewPx(e.nativeEvent.layout.width)}
          onContentSizeChange={(w) => setContentPx(w)}
        >
          <View>
            <View style={lineStyle(true)}>
              {columns.map((c) => cell(c.unit ? `${c.title}\n${c.unit}` : c.title, WIDTH.value, c.field, true, true))}
              {cell('Build', WIDTH.build, 'build', true)}
            </View>
            {shots.map((s) => (
              <View key={s.row} style={lineStyle(false)}>
                {columns.map((c) =>
                  cell(formatShotValue(s, c.field, units) + (s.derived.includes(c.field) ? '*' : ''), WIDTH.value, c.field, false, true),
                )}
                {cell(s.build ?? '–', WIDTH.build, 'build')}
              </View>
            ))}
          </View>
        </ScrollView>
      </View>
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
  table: { flexDirection: 'row' },
  pinned: { borderRightWidth: 1, borderRightColor: colors.border },
  scroll: { flex: 1 },
  line: { flexDirection: 'row', borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.border },
  headLine: { borderBottomColor: colors.ink, borderBottomWidth: 1 },
  cell: { paddingHorizontal: 6, justifyContent: 'center' },
  headCell: { justifyContent: 'flex-end', paddingBottom: 4 },
  right: { textAlign: 'right' },
});
