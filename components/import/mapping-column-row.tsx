import { StyleSheet, View } from 'react-native';
import type { ColumnSuggestion, ColumnTarget, RecipeColumn, SideNotation } from '@/analysis/import';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import { ChoiceField } from '../ui/choice-field';
import { SelectField } from '../ui/select-field';
import type { ColumnNote } from './column-note';
import { ConfidenceBadge } from './confidence-badge';
import { ASK_HAND_FIELDS, HAND_OPTIONS, isSideTarget, mayBeHanded, SIDE_OPTIONS, TARGET_OPTIONS, unitName, unitOptionsFor } from './recipe-edit';

/** The answers to an open sign question: the two signed conventions, in the trade's words. */
const SIGN_ANSWERS: readonly { value: SideNotation | 'for-hand'; label: string }[] = [
  { value: 'signed-right-positive', label: '+ is right, − is left' },
  { value: 'signed-left-positive', label: '+ is left, − is right' },
];

/** For a left-hander's path or face: the third answer, + as the player's hand says it. */
const HAND_ANSWER: Partial<Record<string, string>> = {
  clubPath: '+ is in-to-out for this left-hander',
  faceAngle: '+ is open for this left-hander',
};

type MappingColumnRowProps = {
  suggestion: ColumnSuggestion;
  column: RecipeColumn;
  /** Why it is read this way (column-note.ts). */
  note: ColumnNote;
  onField: (field: ColumnTarget) => void;
  onUnit: (unit: string) => void;
  onSide: (side: SideNotation) => void;
  /** An answer to the column's sign question (a notation, or written for the player's hand). */
  onSignAnswer: (answer: SideNotation | 'for-hand') => void;
  /** The player's hand (from the preview); a left-hander's signed columns may be written for it. */
  hand?: 'right' | 'left';
  onHanded: (handed: boolean) => void;
};

/** One column of the file: its header and samples as written, and what Ovalyard reads it as. */
export function MappingColumnRow({ suggestion, column, note, onField, onUnit, onSide, onSignAnswer, hand, onHanded }: MappingColumnRowProps) {
  const header = suggestion.header;
  // A doubtful reading of the column stands out; an open sign question is asked below instead.
  const low = note.attention && !note.question;
  const units = unitOptionsFor(column.field);
  const unit = unitName(column.unit) ?? '';
  const unitChoices = unit || units.length === 0 ? units : [{ value: '', label: `Choose (file says "${column.unit ?? '?'}")` }, ...units];
  const ignored = column.field === 'ignore';
  // Whose left and right: asked for a left-handed player's signed columns (and shown wherever a recipe set it).
  const handAnswer = hand === 'left' ? HAND_ANSWER[column.field] : undefined;
  const signAnswers = handAnswer ? [...SIGN_ANSWERS, { value: 'for-hand' as const, label: handAnswer }] : SIGN_ANSWERS;
  const askHand = mayBeHanded(column) && !note.question && ((hand === 'left' && ASK_HAND_FIELDS.has(column.field)) || column.handed === true);
  return (
    <View style={[styles.row, (low || note.question) && styles.low, ignored && styles.ignored]} accessibilityLabel={`Column ${header}`}>
      <View style={styles.head}>
        <AppText variant="bodyStrong" style={styles.header} numberOfLines={2}>
          {header}
        </AppText>
        <ConfidenceBadge confidence={suggestion.confidence} chosenBy={note.badge} attention={note.question} />
      </View>
      <AppText variant="caption" tone="muted" numberOfLines={1}>
        {suggestion.samples.length ? suggestion.samples.join('  ·  ') : 'No values in the first rows'}
      </AppText>
      <View style={styles.controls}>
        <View style={styles.target}>
          <SelectField label={`${header}: read as`} hideLabel value={column.field} options={TARGET_OPTIONS} onChange={onField} attention={low} />
        </View>
        {units.length > 0 ? (
          <View style={styles.small}>
            <SelectField label={`${header}: unit`} hideLabel value={unit} options={unitChoices} onChange={(u) => u && onUnit(u)} attention={!unit} />
          </View>
        ) : null}
        {isSideTarget(column.field) && !note.question ? (
          <View style={styles.small}>
            <SelectField
              label={`${header}: left and right`}
              hideLabel
              value={column.side ?? 'signed-right-positive'}
              options={SIDE_OPTIONS}
              onChange={onSide}
            />
          </View>
        ) : null}
      </View>
      {askHand ? (
        <View style={styles.hand}>
          <SelectField
            label={`${header}: whose left and right`}
            value={column.handed ? 'hand' : 'target'}
            options={HAND_OPTIONS}
            onChange={(v) => v && onHanded(v === 'hand')}
          />
          <AppText variant="caption" tone="muted">
            {column.handed
              ? 'Written for the player’s hand: for a left-hander + is in-to-out or open, pointing left; Ovalyard turns it round to + is right.'
              : 'Left and right as seen from behind the ball, the same for both hands. A file that writes in-to-out and open as + for a left-hander is “For the player’s hand”.'}
          </AppText>
        </View>
      ) : null}
      <AppText variant="caption" tone={low ? 'default' : 'muted'}>
        {note.text}
      </AppText>
      {note.question ? (
        <View style={styles.question}>
          <ChoiceField<SideNotation | 'for-hand' | ''>
            label={`In “${header}”, which way does + point?`}
            value=""
            options={signAnswers}
            onChange={(answer) => answer && onSignAnswer(answer)}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    gap: space.xs,
    padding: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  low: { borderColor: colors.caution, borderLeftWidth: 4 },
  ignored: { backgroundColor: colors.paper },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  header: { flexShrink: 1 },
  controls: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
  target: { flexGrow: 2, flexBasis: 160, minWidth: 0, maxWidth: 420 },
  small: { flexGrow: 1, flexBasis: 110, minWidth: 0, maxWidth: 240 },
  hand: { gap: space.xs, maxWidth: 420 },
  question: { marginTop: space.xs, padding: space.sm, borderRadius: radius.md, backgroundColor: colors.cautionSoft },
});
