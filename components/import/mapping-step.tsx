import { StyleSheet, View } from 'react-native';
import type { BayFilePreview } from '../queries/bay-files';
import type { Recipe } from '@/analysis/import';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { columnNote } from './column-note';
import { MappingColumnRow } from './mapping-column-row';
import { confidenceLevel, effectiveColumn } from './recipe-edit';
import { reasonWithoutSignGuess } from './sign-questions';
import type { MappingSession } from './use-mapping-session';

type MappingStepProps = {
  session: MappingSession;
  preview: BayFilePreview;
  /** The stored mapping the edits go on top of (a re-map). */
  base?: Recipe;
  /** A saved recipe was chosen (an import). */
  fromRecipe?: boolean;
  /** Whether a column is read as the build (else every shot goes in as "No build named"). */
  hasBuildColumn: boolean;
  /** Builds come from the file's build column (not named on this page). */
  buildsFromColumn: boolean;
};

/** "a", "a and b", "a, b and c". */
const listWords = (items: readonly string[]): string =>
  items.length < 2 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;

const DELIMITER_WORDS = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' } as const;

/** One row per column of the file; every edit re-runs the preview. */
export function MappingStep({ session, preview, base, fromRecipe = false, hasBuildColumn, buildsFromColumn }: MappingStepProps) {
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
      {session.signQuestions.length > 0 ? (
        <Notice tone="caution" title={session.signQuestions.length === 1 ? 'A question about left and right' : 'Questions about left and right'}>
          {`The file gives ${listWords(session.signQuestions.map((h) => `“${h}”`))} as signed numbers and does not say which way + points. Answer on ${session.signQuestions.length === 1 ? 'its row' : 'their rows'} below: a wrong guess mirrors every shot.`}
        </Notice>
      ) : null}
      {!hasBuildColumn && buildsFromColumn ? (
        <Notice tone="caution" title="No build column">
          No column of this file is read as the build, so its shots would go in as “No build named”. Set the column that names the
          build to “Build” below, or name the build under Builds.
        </Notice>
      ) : null}
      <View style={styles.list}>
        {preview.suggestions.map((s) => {
          const column = effectiveColumn(s.header, session.overrides, preview.recipe, s);
          const changed = s.header in session.overrides;
          const signQuestion = session.signQuestions.includes(s.header);
          const suggestion = { ...s, reason: reasonWithoutSignGuess(s.reason, preview.ambiguous, s.header) };
          const note = columnNote({ column, suggestion, changed, base, fromRecipe, low: confidenceLevel(s.confidence) === 'low', signQuestion });
          return (
            <MappingColumnRow
              key={s.header}
              suggestion={s}
              column={column}
              note={note}
              onField={(field) => session.setField(s.header, field, column, s)}
              onUnit={(unit) => session.setUnit(s.header, column, unit)}
              onSide={(side) => session.setSide(s.header, column, side)}
              onSignAnswer={(answer) => session.answerSign(s.header, column, answer)}
              hand={preview.hand}
              onHanded={(handed) => session.setHanded(s.header, column, handed)}
            />
          );
        })}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({ list: { gap: space.sm } });
