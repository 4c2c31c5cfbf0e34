import { StyleSheet, View } from 'react-native';
import type { BayFilePreview } from '../queries/bay-files';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Section } from '../ui/section';
import { MappingColumnRow } from './mapping-column-row';
import { effectiveColumn } from './recipe-edit';
import type { ImportSession } from './use-import-session';

type MappingStepProps = { session: ImportSession; preview: BayFilePreview };

const DELIMITER_WORDS = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' } as const;

/** One row per column of the file; every edit re-runs the preview. */
export function MappingStep({ session, preview }: MappingStepProps) {
  const { sniff } = preview;
  const edited = Object.keys(session.overrides).length > 0;
  const read = [
    `Cells split at ${DELIMITER_WORDS[sniff.delimiter]}`,
    `decimal ${sniff.decimal === ',' ? 'comma' : 'point'}`,
    `header on line ${sniff.headerRow + 1}`,
    sniff.unitsRow ? 'units on the line below' : null,
  ].filter(Boolean);
  return (
    <Section
      title="Columns"
      action={edited ? <Button title="Undo my changes" variant="quiet" compact onPress={session.resetMapping} /> : null}
    >
      <AppText tone="muted">{read.join(', ') + '.'}</AppText>
      <View style={styles.list}>
        {preview.suggestions.map((s) => {
          const column = effectiveColumn(s.header, session.overrides, preview.recipe, s);
          return (
            <MappingColumnRow
              key={s.header}
              suggestion={s}
              column={column}
              changed={s.header in session.overrides}
              onField={(field) => session.setField(s.header, field, column, s)}
              onUnit={(unit) => session.setUnit(s.header, column, unit)}
              onSide={(side) => session.setSide(s.header, column, side)}
            />
          );
        })}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({ list: { gap: space.sm } });
