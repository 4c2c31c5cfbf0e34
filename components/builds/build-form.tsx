import { StyleSheet, View } from 'react-native';
import type { Build } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { space } from '../theme';
import { Button } from '../ui/button';
import { FormRow } from '../ui/form-row';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { useTextForm } from '../use-text-form';
import { buildFormText, parseBuildForm, typedLengthIn, type BuildFormText, type BuildSpecBody } from './build-form-values';
import { lengthConformanceNotes } from './conformance';
import { LengthNotes } from './length-notes';
import { WorkshopCaution } from './workshop-caution';

type BuildFormProps = {
  build: Build;
  busy: boolean;
  error: unknown;
  onSubmit: (body: BuildSpecBody) => void;
  onCancel: () => void;
};

/** Every spec of a build; numbers accept a decimal comma; checked with the shared schema before sending. */
export function BuildForm({ build, busy, error, onSubmit, onCancel }: BuildFormProps) {
  const { text, set, errors, shown, submit } = useTextForm(() => buildFormText(build), parseBuildForm, onSubmit, error);
  const field = (key: keyof BuildFormText) => ({ value: text[key], onChangeText: set(key), error: shown[key] });
  const number = { inputMode: 'decimal' as const };
  const notes = lengthConformanceNotes(build.club, typedLengthIn(text));

  return (
    <View style={styles.form}>
      {error ? <Notice tone="danger">{errorMessage(error)}</Notice> : null}
      {Object.keys(errors).length > 0 ? <Notice tone="danger">Some fields need a look; see the notes under them.</Notice> : null}
      <TextField label="Head" {...field('head')} placeholder="Model and size, as the workshop knows it" />
      <FormRow>
        <TextField label="Loft" suffix="°" {...field('loftDeg')} {...number} />
        <TextField label="Hosel setting" {...field('hoselSetting')} placeholder="e.g. +1, upright" />
        <TextField label="Lie" suffix="°" {...field('lieDeg')} {...number} />
      </FormRow>
      <View style={styles.lengthRow}>
        <View style={styles.lengthField}>
          <TextField label="Length" suffix="in" {...field('lengthIn')} {...number} />
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
        <TextField label="Swing weight" {...field('swingWeight')} placeholder="e.g. D2" />
      </FormRow>
      <FormRow>
        <TextField label="Added mass" suffix="g" {...field('addedMassG')} {...number} />
        <TextField label="Added mass where" {...field('addedMassWhere')} placeholder="e.g. heel, back" />
      </FormRow>
      <TextField label="Notes" {...field('notes')} multiline numberOfLines={4} />
      <WorkshopCaution />
      <View style={styles.actions}>
        <Button title="Save" onPress={submit} busy={busy} />
        <Button title="Cancel" variant="quiet" onPress={onCancel} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  lengthRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  lengthField: { flexGrow: 1, flexBasis: 150, minWidth: 0 },
  lengthNotes: { flexGrow: 2, flexBasis: 220, minWidth: 0 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
