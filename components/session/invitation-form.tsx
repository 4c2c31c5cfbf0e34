import { StyleSheet, View } from 'react-native';
import { acceptInvitationBodySchema } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { fieldErrorsFromZod, type FieldErrors } from '../forms';
import { useAcceptInvitationMutation, useInvitationPreviewQuery } from '../queries/invitations';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { useTextForm, type Parsed } from '../use-text-form';
import { PASSWORD_MISMATCH } from './reset-form';

type InvitationFormProps = { token: string };
type Body = { token: string; password: string };

/** Who invited whom, and the password twice; accepting signs the person in (the app takes them to their start page). */
export function InvitationForm({ token }: InvitationFormProps) {
  const preview = useInvitationPreviewQuery(token);
  const accept = useAcceptInvitationMutation();
  const form = useTextForm(
    () => ({ password: '', confirm: '' }),
    (text): Parsed<Body> => {
      const parsed = acceptInvitationBodySchema.safeParse({ token, password: text.password });
      const errors: FieldErrors = parsed.success ? {} : fieldErrorsFromZod(parsed.error);
      if (text.confirm !== text.password) errors.confirm = PASSWORD_MISMATCH;
      return parsed.success && !errors.confirm ? { ok: true, body: parsed.data } : { ok: false, errors };
    },
    (body: Body) => accept.mutate(body),
    accept.error,
  );

  if (preview.isPending) return <LoadingState label="Opening the invitation…" />;
  if (preview.isError) {
    return (
      <View style={styles.form}>
        <AppText variant="heading" accessibilityRole="header">
          Invitation
        </AppText>
        <Notice tone="danger">{errorMessage(preview.error)}</Notice>
      </View>
    );
  }
  const { name, email, shopName, role } = preview.data;
  const banner = accept.error && !form.shown.password ? errorMessage(accept.error) : null;
  return (
    <View style={styles.form}>
      <AppText variant="heading" accessibilityRole="header">
        {`Welcome, ${name}`}
      </AppText>
      <AppText>{`${shopName} invited you ${role === 'fitter' ? 'as a fitter' : 'to see your fittings and your bag'}. Choose a password to sign in with ${email}.`}</AppText>
      {banner ? <Notice tone="danger">{banner}</Notice> : null}
      <TextField
        label="Password"
        value={form.text.password}
        onChangeText={form.set('password')}
        error={form.shown.password}
        hint="At least 10 characters; a few unrelated words work well."
        secureTextEntry
        autoComplete="new-password"
      />
      <TextField
        label="Password again"
        value={form.text.confirm}
        onChangeText={form.set('confirm')}
        error={form.shown.confirm}
        secureTextEntry
        autoComplete="new-password"
        returnKeyType="go"
        onSubmitEditing={form.submit}
      />
      <Button title="Set the password and sign in" onPress={form.submit} busy={accept.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
