import type { ReactNode } from 'react';
import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { colors, layout, space } from '../theme';
import { AppText } from '../ui/app-text';

export type PinnedColumn = {
  /** Cells start at the left (text) rather than the right (numbers). */
  alignLeft?: boolean;
  key: string;
  /** Title, unit on a second line when given. */
  title: string;
  unit?: string;
  widthPx: number;
  /** Sorted by this column: 'asc' or 'desc'; undefined: not sortable; null: sortable, not sorted. */
  sort?: 'asc' | 'desc' | null;
};

export type PinnedRow = { key: string; pinned: ReactNode; cells: ReactNode[]; highlighted?: boolean };

type PinnedTableProps = {
  label: string;
  /** Title of the pinned first column. */
  pinnedTitle: string;
  pinnedWidthPx: number;
  columns: readonly PinnedColumn[];
  rows: readonly PinnedRow[];
  rowHeightPx?: number;
  onSort?: (key: string) => void;
};

const HEAD_PX = 60;

/**
 * A table whose first column (club and build) stays put while the others scroll sideways, with
 * a hint when they do. Rows have one fixed height so the two parts line up; header cells of
 * sortable columns are buttons at least 44 px tall.
 */
export function PinnedTable({ label, pinnedTitle, pinnedWidthPx, columns, rows, rowHeightPx = 52, onSort }: PinnedTableProps) {
  const [viewWidth, setViewWidth] = useState(0);
  const contentWidth = columns.reduce((s, c) => s + c.widthPx, 0);
  const overflows = viewWidth > 0 && contentWidth > viewWidth + 1;
  const row = { height: rowHeightPx };
  return (
    <View style={styles.box} accessibilityLabel={label}>
      {overflows ? (
        <AppText variant="caption" tone="muted" accessibilityRole="text">
          Swipe or scroll sideways for more columns →
        </AppText>
      ) : null}
      <View style={styles.frame}>
        <View style={[styles.pinned, { width: pinnedWidthPx }]}>
          <View style={[styles.cell, styles.head, { height: HEAD_PX }]}>
            <AppText variant="label" style={styles.headText}>{pinnedTitle}</AppText>
          </View>
          {rows.map((r) => (
            <View key={r.key} style={[styles.cell, styles.line, row, r.highlighted && styles.highlighted]}>
              {r.pinned}
            </View>
          ))}
        </View>
        <ScrollView horizontal showsHorizontalScrollIndicator onLayout={(e) => setViewWidth(Math.floor(e.nativeEvent.layout.width))} style={styles.scroll}>
          <View style={{ width: contentWidth }}>
            <View style={[styles.rowLine, styles.head, { height: HEAD_PX }]}>
              {columns.map((c) => {
                const text = (
                  <>
                    <AppText variant="label" style={[styles.headText, c.alignLeft ? styles.left : styles.right]} numberOfLines={2}>
                      {`${c.title}${c.sort === 'asc' ? ' ▲' : c.sort === 'desc' ? ' ▼' : ''}`}
                    </AppText>
                    {c.unit ? <AppText variant="caption" tone="muted" style={c.alignLeft ? styles.left : styles.right}>{c.unit}</AppText> : null}
                  </>
                );
                return c.sort !== undefined && onSort ? (
                  <Pressable
                    key={c.key}
                    accessibilityRole="button"
                    accessibilityLabel={`Sort by ${c.title}${c.sort ? (c.sort === 'asc' ? ', now ascending' : ', now descending') : ''}`}
                    onPress={() => onSort(c.key)}
                    style={[styles.headCell, { width: c.widthPx }]}
                  >
                    {text}
                  </Pressable>
                ) : (
                  <View key={c.key} style={[styles.headCell, { width: c.widthPx }]}>{text}</View>
                );
              })}
            </View>
            {rows.map((r) => (
              <View key={r.key} style={[styles.rowLine, styles.line, row, r.highlighted && styles.highlighted]}>
                {r.cells.map((cell, i) => (
                  <View key={columns[i]?.key ?? i} style={[styles.valueCell, columns[i]?.alignLeft && styles.leftCell, { width: columns[i]?.widthPx ?? 80 }]}>
                    {cell}
                  </View>
                ))}
              </View>
            ))}
          </View>
        </ScrollView>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  frame: { flexDirection: 'row' },
  pinned: { borderRightWidth: 1, borderRightColor: colors.border, backgroundColor: colors.paper, zIndex: 1 },
  scroll: { flex: 1 },
  cell: { justifyContent: 'center', paddingHorizontal: space.sm },
  head: { borderBottomWidth: 1, borderBottomColor: colors.ink },
  headText: { color: colors.textMuted },
  headCell: { minHeight: layout.minTouchPx, justifyContent: 'center', paddingHorizontal: space.sm },
  right: { textAlign: 'right' },
  left: { textAlign: 'left' },
  rowLine: { flexDirection: 'row', alignItems: 'center' },
  line: { borderBottomWidth: 1, borderBottomColor: colors.border },
  valueCell: { paddingHorizontal: space.sm, alignItems: 'flex-end', justifyContent: 'center' },
  leftCell: { alignItems: 'flex-start' },
  highlighted: { backgroundColor: colors.accentSoft },
});
