import { StyleSheet, View } from 'react-native';
import { COURSE_STEP_WORDS, COURSE_STEPS, type CourseStep, type FittingSort } from '@/server/schemas';
import { Button } from '../ui/button';
import { DateField } from '../ui/date-field';
import { FormRow } from '../ui/form-row';
import { SelectField } from '../ui/select-field';
import { TextField } from '../ui/text-field';
import { space } from '../theme';

/** What the fittings list is searched, filtered and sorted by, as the inputs show it. */
export type FittingFilterText = { q: string; from: string; to: string; sort: FittingSort; step: CourseStep | 'any' };

export const NO_FITTING_FILTERS: FittingFilterText = { q: '', from: '', to: '', sort: 'date-desc', step: 'any' };

const STEPS: readonly { value: CourseStep | 'any'; label: string }[] = [{ value: 'any', label: 'Any step' }, ...COURSE_STEPS.map((s) => ({ value: s, label: COURSE_STEP_WORDS[s] }))];

const SORTS: readonly { value: FittingSort; label: string }[] = [
  { value: 'date-desc', label: 'Newest first' },
  { value: 'date-asc', label: 'Oldest first' },
  { value: 'player-asc', label: 'Player A–Z' },
  { value: 'player-desc', label: 'Player Z–A' },
];

/** Whether anything narrows the list (the order alone does not). */
export const hasFittingFilters = (f: FittingFilterText): boolean => f.q.trim() !== '' || f.from !== '' || f.to !== '' || f.step !== 'any';

type FittingFilterBarProps = { value: FittingFilterText; onChange: (next: FittingFilterText) => void };

/** Search by player, a date range and the order of the shop's fittings (the server filters and sorts). */
export function FittingFilterBar({ value, onChange }: FittingFilterBarProps) {
  const set = <K extends keyof FittingFilterText>(key: K) => (v: FittingFilterText[K]) => onChange({ ...value, [key]: v });
  return (
    <View style={styles.bar}>
      {/* One row on a wide screen; on a phone the search, the two dates side by side, then the order. */}
      <FormRow basisPx={290}>
        <TextField
          label="Search by player"
          value={value.q}
          onChangeText={set('q')}
          placeholder="Player's name"
          autoCapitalize="none"
          autoCorrect={false}
          inputMode="search"
        />
        <FormRow basisPx={130}>
          <DateField label="From" value={value.from} onChange={set('from')} max={value.to || undefined} />
          <DateField label="To" value={value.to} onChange={set('to')} min={value.from || undefined} />
        </FormRow>
        <FormRow basisPx={130}>
          <SelectField label="Step" value={value.step} options={STEPS} onChange={set('step')} />
          <SelectField label="Sort" value={value.sort} options={SORTS} onChange={set('sort')} />
        </FormRow>
      </FormRow>
      {hasFittingFilters(value) ? (
        <Button title="Clear the filters" variant="quiet" compact onPress={() => onChange({ ...NO_FITTING_FILTERS, sort: value.sort })} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ bar: { gap: space.md } });
