import { StyleSheet, View } from 'react-native';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import type { VerdictRow } from './verdict-rows';

type VerdictListProps = { rows: readonly VerdictRow[] };

/**
 * The head-to-head table as a list: each field's name and verdict on one line, its numbers on
 * the next (they wrap rather than run into each other on a phone).
 */
export function VerdictList({ rows }: VerdictListProps) {
  return (
    <View accessibilityLabel="Head-to-head table" style={styles.list}>
      {rows.map((r) => (
        <View key={r.key} style={styles.row} testID="verdict-row">
          <View style={styles.head}>
            <AppText variant="bodyStrong" style={styles.name}>{r.label}</AppText>
            <AppText variant="label" style={{ color: r.verdict === 'clear' ? colors.ink : r.verdict === 'equivalent' ? colors.success : colors.textMuted }}>
              {r.verdictText}
            </AppText>
          </View>
          <AppText variant="caption">{r.detail}</AppText>
          {r.more ? <AppText variant="caption" tone="muted">{r.more}</AppText> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  row: { paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.border, gap: 2 },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: space.md, flexWrap: 'wrap' },
  name: { flexShrink: 1 },
});
