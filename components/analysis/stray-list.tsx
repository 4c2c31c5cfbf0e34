import { StyleSheet, View } from 'react-native';
import type { GroupAnalysis } from '@/analysis/session';
import type { PlotShot } from '@/server/schemas';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';

type StrayListProps = {
  groups: readonly GroupAnalysis[];
  shots: readonly PlotShot[];
  canDecide: boolean;
  onDecide: (shotId: number, decision: 'keep' | 'drop' | null) => void;
  deciding: boolean;
};

/**
 * Shots the stray rules flagged, and shots the fitter decided on, with the reason in words.
 * The fitter keeps a flagged shot, drops a good one, or hands it back to the rules.
 */
export function StrayList({ groups, shots, canDecide, onDecide, deciding }: StrayListProps) {
  const reasons = new Map<number, string>();
  for (const g of groups) for (const s of g.strays) reasons.set(s.row, s.reason);
  const listed = shots.filter((s) => reasons.has(s.id) || s.decision !== null);
  if (listed.length === 0) return <AppText variant="caption" tone="muted">No strays: every shot of this club is in the figures.</AppText>;
  return (
    <View style={styles.list}>
      <AppText variant="label">Strays and decisions</AppText>
      {listed.map((s) => {
        const inFigures = s.decision === 'keep' || (s.decision === null && !s.stray);
        return (
          <View key={s.id} style={styles.row}>
            <View style={styles.text}>
              <AppText variant="bodyStrong">{`Shot ${s.row}${s.build ? ` · ${s.build}` : ''}`}</AppText>
              <AppText variant="caption" tone="muted">{reasons.get(s.id) ?? (s.decision === 'drop' ? 'Dropped by the fitter.' : 'Kept by the fitter.')}</AppText>
              <AppText variant="caption" style={{ color: inFigures ? colors.success : colors.caution }}>{inFigures ? 'In the figures' : 'Left out of the figures'}</AppText>
            </View>
            {canDecide ? (
              <View style={styles.actions}>
                {s.decision !== null ? (
                  <Button compact variant="quiet" title="Use the rules" busy={deciding} onPress={() => onDecide(s.id, null)} />
                ) : inFigures ? (
                  <Button compact variant="secondary" title="Drop" busy={deciding} onPress={() => onDecide(s.id, 'drop')} />
                ) : (
                  <Button compact variant="secondary" title="Keep" busy={deciding} onPress={() => onDecide(s.id, 'keep')} />
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
