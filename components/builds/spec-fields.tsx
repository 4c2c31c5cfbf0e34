import { StyleSheet, View } from 'react-native';
import { CM_PER_IN } from '@/analysis/units';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { FormRow } from '../ui/form-row';
import { TextField } from '../ui/text-field';
import { typedLengthIn, type BuildFormText } from './build-form-values';
import { lengthConformanceNotes } from './conformance';
import { LengthNotes } from './length-notes';

type SpecFieldsProps = {
  club: string;
  text: BuildFormText;
  set: (key: keyof BuildFormText) => (value: string) => void;
  errors: Record<string, string>;
};

/** Every spec input of a build or bag club, with live notes on the length against the rules. */
export function SpecFields({ club, text, set, errors }: SpecFieldsProps) {
  const field = (key: keyof BuildFormText) => ({ value: text[key], onChangeText: set(key), error: errors[key] });
  const number = { inputMode: 'decimal' as const };
  const notes = lengthConformanceNotes(club, typedLengthIn(text));
  const me = useMe();
  const typedIn = typedLengthIn(text);
  // Club lengths are written in inches in every workshop (common practice, no source); a user who
  // reads lengths in cm sees the typed length in cm as well.
  const lengthHint = me.lengthUnit === 'cm' ? `Club lengths are in inches${typedIn != null ? ` (${(typedIn * CM_PER_IN).toFixed(1)} cm)` : ''}` : undefined;
  return (
    <View style={styles.fields}>
      <TextField label="Head" {...field('head')} placeholder="Model and size, as the workshop knows it" />
      <FormRow>
        <TextField label="Loft" suffix="°" {...field('loftDeg')} {...number} />
        <TextField label="Lie" suffix="°" {...field('lieDeg')} {...number} />
      </FormRow>
      <TextField label="Hosel setting" {...field('hoselSetting')} placeholder="e.g. +1, upright" />
      <FormRow>
        <TextField label="Hosel loft change" suffix="°" {...field('hoselLoftChangeDeg')} {...number} hint="From the head maker’s chart" />
        <TextField label="Hosel lie change" suffix="°" {...field('hoselLieChangeDeg')} {...number} />
        <TextField label="Hosel face change" suffix="°" {...field('hoselFaceChangeDeg')} {...number} />
      </FormRow>
      <View style={styles.lengthRow}>
        <View style={styles.lengthField}>
          <TextField label="Length" suffix="in" {...field('lengthIn')} {...number} hint={lengthHint} />
        </View>
        {notes.length > 0 ? (
          <View style={styles.lengthNotes} aria-live="polite">
            <LengthNotes notes={notes} />
          </View>
        ) : null}
      </View>
      <FormRow>
        <TextField label="Shaft" {...field('shaft')} placeholder="Model" />
        <TextField label="Shaft weight" suffix="g" {...field('shaftWeightG')} {...number} />
      </FormRow>
      <FormRow>
        <TextField label="Flex" {...field('shaftFlex')} placeholder="e.g. R, S, X" />
        <TextField label="Torque" suffix="°" {...field('torqueDeg')} {...number} />
      </FormRow>
      <FormRow>
        <TextField label="Grip" {...field('grip')} />
        <TextField label="Grip size" {...field('gripSize')} placeholder="e.g. Midsize" />
      </FormRow>
      <FormRow>
        <TextField label="Swing weight" {...field('swingWeight')} placeholder="e.g. D2" />
        <TextField label="Total weight" suffix="g" {...field('totalWeightG')} {...number} />
        <TextField label="Balance point" suffix="in" {...field('balancePointIn')} {...number} hint="From the grip end" />
      </FormRow>
      <FormRow>
        <TextField label="Added mass" suffix="g" {...field('addedMassG')} {...number} />
        <TextField label="Added mass where" {...field('addedMassWhere')} placeholder="e.g. heel, back" />
      </FormRow>
      <TextField label="Notes" {...field('notes')} multiline numberOfLines={4} />
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  lengthRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  lengthField: { flexGrow: 1, flexBasis: 150, minWidth: 0 },
  lengthNotes: { flexGrow: 2, flexBasis: 220, minWidth: 0 },
});
