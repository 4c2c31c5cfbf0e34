import { StyleSheet, View } from 'react-native';
import type { GroupAnalysis, SessionStray } from '@/analysis/session';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import type { AnalysisShot } from './plot-shots';

type StrayListProps = {
  groups: readonly GroupAnalysis[];
  shots: readonly AnalysisShot[];
  canDecide: boolean;
  onDecide: (shotId: number, decision: 'keep' | 'drop' | null) => void;
  deciding: boolean;
};

/**
 * Shots the stray rules flagged (misreads, mishits, and directional misses for review), and
 * shots the fitter decided on, with the reason in words. The fitter keeps a left-out shot,
 * drops one that is in, or hands it back to the rules.
 */
export function StrayList({ groups, shots, canDecide, onDecide, deciding }: StrayListProps) {
  const listed = new Map<number, SessionStray>();
  for (const g of groups) for (const s of g.strays) listed.set(s.row, s);
  const rows = shots.filter((s) => listed.has(s.id));
  if (rows.length === 0) return <AppText variant="caption" tone="muted">No strays: every shot of this club is in the figures.</AppText>;
  return (
    <View style={styles.list}>
      <AppText variant="label">Strays and decisions</AppText>
      {rows.map((s) => {
        const stray = listed.get(s.id)!;
        return (
          <View key={s.id} style={styles.row}>
            <View style={styles.text}>
              <AppText variant="bodyStrong">{`Shot ${s.row}${s.build ? ` · ${s.build}` : ''}`}</AppText>
              <AppText variant="caption" tone="muted">{stray.reason}</AppText>
              <AppText variant="caption" style={{ color: stray.inFigures ? colors.success : colors.caution }}>{stray.inFigures ? 'In the figures' : 'Left out of the figures'}</AppText>
            </View>
            {canDecide ? (
              <View style={styles.actions}>
                {s.decision !== null ? (
                  <Button compact variant="quiet" title="Use the rules" accessibilityLabel={`Use the rules for shot ${s.row}`} busy={deciding} onPress={() => onDecide(s.id, null)} />
                ) : stray.inFigures ? (
                  <Button compact variant="secondary" title="Drop" accessibilityLabel={`Drop shot ${s.row}`} busy={deciding} onPress={() => onDecide(s.id, 'drop')} />
                ) : (
                  <Button compact variant="secondary" title="Keep" accessibilityLabel={`Keep shot ${s.row}`} busy={deciding} onPress={() => onDecide(s.id, 'keep')} />
                )}
              </View>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm, marginTop: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderTopWidth: 1, borderTopColor: colors.border, paddingTop: space.sm },
  text: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row', gap: space.sm },
});
