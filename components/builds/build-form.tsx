import { StyleSheet, View } from 'react-native';
import type { Build } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { space } from '../theme';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { useTextForm } from '../use-text-form';
import { buildFormText, parseBuildForm, type BuildSpecBody } from './build-form-values';
import { SpecFields } from './spec-fields';
import { WorkshopCaution } from './workshop-caution';
import { WorkshopEffectsNote } from './workshop-effects-note';

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
  return (
    <View style={styles.form}>
      {error ? <Notice tone="danger">{errorMessage(error)}</Notice> : null}
      {Object.keys(errors).length > 0 ? <Notice tone="danger">Some fields need a look; see the notes under them.</Notice> : null}
      <SpecFields club={build.club} text={text} set={set} errors={shown} />
      <WorkshopEffectsNote saved={{ addedMassG: build.addedMassG ?? null, lengthIn: build.lengthIn ?? null, swingWeight: build.swingWeight ?? null }} text={text} />
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
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
