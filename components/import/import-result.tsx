import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { BayFile } from '@/server/schemas';
import { plural } from '../format';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { RejectedRows } from './rejected-rows';

type ImportResultProps = {
  bayFile: BayFile;
  /** The section title: "Imported", "New mapping applied". */
  title: string;
  /** A line under the counts (a re-map: the count before, and what stays). */
  note?: string;
  onDone: () => void;
  /** The second way on ("Import another file", "Change it again"). */
  another: { title: string; onPress: () => void };
};

/** What the stored import (or re-map) did: shots imported, rows rejected with reasons, lines skipped. */
export function ImportResult({ bayFile, title, note, onDone, another }: ImportResultProps) {
  const { report } = bayFile;
  const groups = report.groups.map((g) => `${clubInfo(g.club)?.label ?? g.club}${g.build ? ` · ${g.build}` : ''}: ${plural(g.n, 'shot')}`);
  return (
    <Section title={title}>
      <Notice tone="success" title={`${plural(bayFile.shotCount, 'shot')} imported`}>
        <AppText>{`From "${bayFile.fileName}": ${plural(report.rows, 'row')} read, ${plural(report.rejected.length, 'row')} not imported.`}</AppText>
        {note ? <AppText>{note}</AppText> : null}
      </Notice>
      {groups.length ? (
        <View style={styles.groups}>
          {groups.map((g, i) => (
            <AppText key={i} tone="muted">
              {g}
            </AppText>
          ))}
        </View>
      ) : null}
      <RejectedRows report={report} />
      <View style={styles.actions}>
        <Button title="Back to the fitting" onPress={onDone} />
        <Button title={another.title} variant="secondary" onPress={another.onPress} />
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({ actions: { gap: space.sm }, groups: { gap: 2 } });
