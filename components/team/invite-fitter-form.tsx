import { StyleSheet, View } from 'react-native';
import { fitterInvitationBodySchema } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { useInviteFitterMutation } from '../queries/invitations';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { parseWith, useTextForm } from '../use-text-form';

type InviteFitterFormProps = { onDone: () => void; onCancel: () => void };

/** The owner invites a fitter by e-mail; the fitter chooses their own password from the link. */
export function InviteFitterForm({ onDone, onCancel }: InviteFitterFormProps) {
  const invite = useInviteFitterMutation();
  const { text, set, shown, submit } = useTextForm(
    () => ({ name: '', email: '' }),
    parseWith(fitterInvitationBodySchema),
    (body) => invite.mutate(body, { onSuccess: onDone }),
    invite.error,
  );
  const banner =
    invite.error instanceof ApiError && invite.error.code === 'EMAIL_TAKEN' ? 'Someone in your shop already signs in with that address.' : invite.error ? errorMessage(invite.error) : null;
  return (
    <View style={styles.form}>
      <AppText tone="muted">We e-mail a link (valid 7 days); the fitter opens it and chooses their own password.</AppText>
      {banner ? <Notice tone="danger">{banner}</Notice> : null}
      <TextField label="Name" value={text.name} onChangeText={set('name')} error={shown.name} />
      <TextField label="E-mail" value={text.email} onChangeText={set('email')} error={shown.email} autoCapitalize="none" keyboardType="email-address" inputMode="email" />
      <View style={styles.actions}>
        <Button title="Send the invitation" onPress={submit} busy={invite.isPending} />
        <Button title="Cancel" variant="quiet" onPress={onCancel} disabled={invite.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
