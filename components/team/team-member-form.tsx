import { StyleSheet, View } from 'react-native';
import { teamMemberBodySchema } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { useAddFitterMutation } from '../queries/team';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { FirstSignInFields } from '../ui/first-sign-in-fields';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { parseWith, useTextForm } from '../use-text-form';

type TeamMemberFormProps = { onDone: () => void; onCancel: () => void };

/** Adds a fitter to the shop with a first password the owner hands over. */
export function TeamMemberForm({ onDone, onCancel }: TeamMemberFormProps) {
  const add = useAddFitterMutation();
  const { text, set, shown, submit } = useTextForm(
    () => ({ name: '', email: '', password: '' }),
    parseWith(teamMemberBodySchema),
    (body) => add.mutate(body, { onSuccess: onDone }),
    add.error,
  );

  const banner =
    add.error instanceof ApiError && add.error.code === 'EMAIL_TAKEN'
      ? 'That e-mail address already has a sign-in. Use another.'
      : add.error
        ? errorMessage(add.error)
        : null;

  return (
    <View style={styles.form}>
      <AppText tone="muted">The new fitter signs in with this e-mail and first password.</AppText>
      {banner ? <Notice tone="danger">{banner}</Notice> : null}
      <TextField label="Name" value={text.name} onChangeText={set('name')} error={shown.name} />
      <FirstSignInFields email={text.email} password={text.password} onChange={set} errors={shown} />
      <View style={styles.actions}>
        <Button title="Add fitter" onPress={submit} busy={add.isPending} />
        <Button title="Cancel" variant="quiet" onPress={onCancel} disabled={add.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
