import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { todayIsoDate } from '../format';
import { space } from '../theme';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';

type BagDatePickerProps = { on: string | null; onChange: (on: string | null) => void };

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** "The bag as it was on …": a date (YYYY-MM-DD) and a way back to today. */
export function BagDatePicker({ on, onChange }: BagDatePickerProps) {
  const [text, setText] = useState(on ?? '');
  const [error, setError] = useState<string | undefined>();
  const show = () => {
    const t = text.trim();
    if (!ISO_DATE.test(t) || Number.isNaN(Date.parse(t))) return setError('Enter a date as YYYY-MM-DD.');
    if (t > todayIsoDate()) return setError('Choose today or a day before.');
    setError(undefined);
    onChange(t);
  };
  return (
    <View style={styles.row}>
      <View style={styles.field}>
        <TextField label="The bag as it was on" value={text} onChangeText={setText} placeholder="YYYY-MM-DD" error={error} inputMode="numeric" />
      </View>
      <View style={styles.actions}>
        <Button title="Show" variant="secondary" compact onPress={show} />
        {on ? (
          <Button
            title="Today"
            variant="quiet"
            compact
            onPress={() => {
              setText('');
              onChange(null);
            }}
          />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.md },
  field: { flexGrow: 1, flexBasis: 200, minWidth: 0 },
  actions: { flexDirection: 'row', gap: space.sm, paddingBottom: 2 },
});
