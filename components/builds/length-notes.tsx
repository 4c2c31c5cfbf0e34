import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import type { ConformanceNote } from './conformance';

type LengthNotesProps = { notes: readonly ConformanceNote[]; compact?: boolean };

/** Short notes on a length against the rules: shown, never blocking. `compact`: titles only (a list row). */
export function LengthNotes({ notes, compact = false }: LengthNotesProps) {
  if (notes.length === 0) return null;
  return (
    <View style={styles.list}>
      {notes.map((n) => (
        <View key={n.code} style={[styles.note, n.severity === 'nonconforming' ? styles.nonconforming : styles.localRule]}>
          <AppText variant="label" style={{ color: n.severity === 'nonconforming' ? colors.danger : colors.caution }}>
            {compact ? `${n.title}: ${n.severity === 'nonconforming' ? 'does not conform' : 'see Local Rule G-10'}` : n.title}
          </AppText>
          {compact ? null : <AppText variant="caption">{n.text}</AppText>}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  note: { alignSelf: 'flex-start', maxWidth: '100%', borderLeftWidth: 3, borderRadius: radius.sm, paddingVertical: space.xs, paddingHorizontal: space.sm, gap: 2 },
  nonconforming: { borderLeftColor: colors.danger, backgroundColor: colors.dangerSoft },
  localRule: { borderLeftColor: colors.caution, backgroundColor: colors.cautionSoft },
});
