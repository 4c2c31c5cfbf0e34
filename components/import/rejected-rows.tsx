import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ImportReport } from '@/server/schemas';
import { plural } from '../format';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { summarizeSkipped } from './import-words';

type RejectedRowsProps = { report: ImportReport };

const FIRST = 8;

/** Rows that were not imported (row, column, reason) and lines skipped on purpose (blank, summary). */
export function RejectedRows({ report }: RejectedRowsProps) {
  const [all, setAll] = useState(false);
  const rejected = all ? report.rejected : report.rejected.slice(0, FIRST);
  const skipped = summarizeSkipped(report.skipped);
  return (
    <View style={styles.box}>
      {report.rejected.length === 0 ? (
        <AppText tone="muted">Every row reads as a shot.</AppText>
      ) : (
        <>
          <AppText variant="bodyStrong" tone="danger">
            {`${plural(report.rejected.length, 'row')} not imported`}
          </AppText>
          {rejected.map((r) => (
            <View key={`${r.row}-${r.column ?? ''}`} style={styles.line}>
              <AppText variant="label" style={styles.rowNo}>{`Row ${r.row}`}</AppText>
              <AppText variant="caption" style={styles.reason}>
                {r.column ? `${r.column}: ${r.reason}` : r.reason}
              </AppText>
            </View>
          ))}
          {report.rejected.length > FIRST ? (
            <Button title={all ? 'Show fewer' : `Show all ${report.rejected.length}`} variant="quiet" compact onPress={() => setAll(!all)} />
          ) : null}
        </>
      )}
      {skipped.length ? (
        <AppText variant="caption" tone="muted">
          {`Skipped: ${skipped.join('; ')}.`}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  line: { flexDirection: 'row', gap: space.sm, paddingVertical: 2, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.border },
  rowNo: { width: 64 },
  reason: { flex: 1 },
});
