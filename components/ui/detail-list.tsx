import { StyleSheet, View } from 'react-native';
import { colors, space } from '../theme';
import { AppText } from './app-text';
import { EmailText } from './email-text';

type DetailItem = {
  label: string;
  value: string | null | undefined;
  /** An e-mail address: wraps after its "@", not mid-word. */
  email?: boolean;
};

type DetailListProps = { items: readonly DetailItem[] };

/** Label–value pairs; a missing value shows as "Not recorded". */
export function DetailList({ items }: DetailListProps) {
  return (
    <View style={styles.list}>
      {items.map((item, i) => (
        <View key={item.label} style={[styles.row, i === items.length - 1 && styles.last]}>
          <AppText variant="label" tone="muted" style={styles.label}>
            {item.label}
          </AppText>
          {item.value && item.email ? (
            <EmailText email={item.value} style={styles.value} selectable />
          ) : (
            <AppText style={[styles.value, !item.value && styles.missing]}>{item.value || 'Not recorded'}</AppText>
          )}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    paddingVertical: space.sm,
    borderBottomWidth: StyleSheet.hairlineWidth,
    borderBottomColor: colors.border,
    gap: space.md,
  },
  label: { width: 124, paddingTop: 2 },
  last: { borderBottomWidth: 0 },
  value: { flex: 1, minWidth: 160 },
  missing: { color: colors.textMuted },
});
