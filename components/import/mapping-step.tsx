import { StyleSheet, View } from 'react-native';
import type { BayFilePreview } from '../queries/bay-files';
import type { Recipe } from '@/analysis/import';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Section } from '../ui/section';
import { columnNote } from './column-note';
import { MappingColumnRow } from './mapping-column-row';
import { confidenceLevel, effectiveColumn } from './recipe-edit';
import type { MappingSession } from './use-mapping-session';

type MappingStepProps = {
  session: MappingSession;
  preview: BayFilePreview;
  /** The stored mapping the edits go on top of (a re-map). */
  base?: Recipe;
  /** A saved recipe was chosen (an import). */
  fromRecipe?: boolean;
};

const DELIMITER_WORDS = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' } as const;

/** One row per column of the file; every edit re-runs the preview. */
export function MappingStep({ session, preview, base, fromRecipe = false }: MappingStepProps) {
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
          const changed = s.header in session.overrides;
          const note = columnNote({ column, suggestion: s, changed, base, fromRecipe, low: confidenceLevel(s.confidence) === 'low' });
          return (
            <MappingColumnRow
              key={s.header}
              suggestion={s}
              column={column}
              note={note}
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
