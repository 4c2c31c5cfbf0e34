import { StyleSheet, View } from 'react-native';
import { resetBodySchema } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { fieldErrorsFromZod, type FieldErrors } from '../forms';
import { useTextForm, type Parsed } from '../use-text-form';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { AuthLink } from './auth-link';
import { useResetPasswordMutation, type ResetBody } from './use-password-reset';

type ResetFormProps = {
  /** The token from the e-mailed link. */
  token: string;
  /** After the password is set: to the sign-in screen. */
  onSignIn: () => void;
};

type ResetText = { password: string; confirm: string };

export const PASSWORD_MISMATCH = 'The two passwords are not the same.';

/** The shared schema's rules (token, length) plus the client-only check that both entries match. */
export function parseResetText(token: string, text: ResetText): Parsed<ResetBody> {
  const parsed = resetBodySchema.safeParse({ token, password: text.password });
  const errors: FieldErrors = parsed.success ? {} : fieldErrorsFromZod(parsed.error);
  if (text.confirm !== text.password) errors.confirm = PASSWORD_MISMATCH;
  if (!parsed.success || errors.confirm) return { ok: false, errors };
  return { ok: true, body: parsed.data };
}

/** The new password twice; errors inline, a used or expired link in the page with a way to a new one. */
export function ResetForm({ token, onSignIn }: ResetFormProps) {
  const reset = useResetPasswordMutation();
  const form = useTextForm<ResetText, ResetBody>(
    () => ({ password: '', confirm: '' }),
    (text) => parseResetText(token, text),
    (body) => reset.mutate(body),
    reset.error,
  );

  if (reset.isSuccess) {
    return (
      <View style={styles.form}>
        <AppText variant="heading" accessibilityRole="header">
          Password set
        </AppText>
        <Notice tone="success">Your password is set. Sign in with it.</Notice>
        <Button title="Sign in" onPress={onSignIn} />
      </View>
    );
  }

  const linkInvalid = (reset.error instanceof ApiError && reset.error.code === 'RESET_LINK_INVALID') || Boolean(form.shown.token);
  const linkMessage = form.shown.token ?? (reset.error ? errorMessage(reset.error) : '');
  const banner = reset.error && !linkInvalid && !form.shown.password ? errorMessage(reset.error) : null;
  return (
    <View style={styles.form}>
      <AppText variant="heading" accessibilityRole="header">
        Set a new password
      </AppText>
      {linkInvalid ? (
        <Notice tone="danger">
          <AppText>{linkMessage}</AppText>
          <AuthLink href="/forgot" align="start">
            Ask for a new link
          </AuthLink>
        </Notice>
      ) : null}
      {banner ? <Notice tone="danger">{banner}</Notice> : null}
      <TextField
        label="New password"
        value={form.text.password}
        onChangeText={form.set('password')}
        error={form.shown.password}
        hint="At least 10 characters."
        secureTextEntry
        autoComplete="new-password"
        returnKeyType="next"
      />
      <TextField
        label="New password again"
        value={form.text.confirm}
        onChangeText={form.set('confirm')}
        error={form.shown.confirm}
        secureTextEntry
        autoComplete="new-password"
        returnKeyType="go"
        onSubmitEditing={form.submit}
      />
      <Button title="Set the password" onPress={form.submit} busy={reset.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
