import { StyleSheet, View } from 'react-native';
import type { BayFile } from '@/server/schemas';
import { plural } from '../format';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { RejectedRows } from './rejected-rows';

type ImportResultProps = { bayFile: BayFile; onDone: () => void; onAnother: () => void };

/** What the stored import did: shots imported, rows rejected with reasons, lines skipped. */
export function ImportResult({ bayFile, onDone, onAnother }: ImportResultProps) {
  const { report } = bayFile;
  const groups = report.groups.map((g) => `${g.club}${g.build ? ` · ${g.build}` : ''}: ${g.n}`);
  return (
    <Section title="Imported">
      <Notice tone="success" title={`${plural(bayFile.shotCount, 'shot')} imported`}>
        <AppText>{`From "${bayFile.fileName}": ${plural(report.rows, 'row')} read, ${plural(report.rejected.length, 'row')} not imported.`}</AppText>
      </Notice>
      {groups.length ? <AppText tone="muted">{groups.join('   ')}</AppText> : null}
      <RejectedRows report={report} />
      <View style={styles.actions}>
        <Button title="Back to the fitting" onPress={onDone} />
        <Button title="Import another file" variant="secondary" onPress={onAnother} />
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({ actions: { gap: space.sm } });
