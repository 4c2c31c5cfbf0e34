import { StyleSheet, View } from 'react-native';
import { forgotBodySchema } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { parseWith, useTextForm } from '../use-text-form';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { AuthLink } from './auth-link';
import { useForgotPasswordMutation } from './use-password-reset';

/**
 * The e-mail to send a reset link to. The answer is the same whether or not the account exists,
 * so the confirmation only says where a link would go.
 */
export function ForgotForm() {
  const forgot = useForgotPasswordMutation();
  const form = useTextForm(() => ({ email: '' }), parseWith(forgotBodySchema), (body) => forgot.mutate(body), forgot.error);

  if (forgot.isSuccess) {
    return (
      <View style={styles.form}>
        <AppText variant="heading" accessibilityRole="header">
          Check your e-mail
        </AppText>
        <Notice tone="success">
          {`If an account uses ${forgot.variables.email}, a link to set a new password is on its way. It works for one hour.`}
        </Notice>
        <AuthLink href="/sign-in">Back to sign in</AuthLink>
      </View>
    );
  }

  // Field errors show under the input; anything else (too many attempts, offline) in a banner.
  const banner = forgot.error && !form.shown.email ? errorMessage(forgot.error) : null;
  return (
    <View style={styles.form}>
      <AppText variant="heading" accessibilityRole="header">
        Forgot your password?
      </AppText>
      <AppText tone="muted">Enter the e-mail you sign in with. We send a link to set a new password.</AppText>
      {banner ? <Notice tone="danger">{banner}</Notice> : null}
      <TextField
        label="E-mail"
        value={form.text.email}
        onChangeText={form.set('email')}
        error={form.shown.email}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        inputMode="email"
        returnKeyType="send"
        onSubmitEditing={form.submit}
      />
      <Button title="Send the link" onPress={form.submit} busy={forgot.isPending} />
      <AuthLink href="/sign-in">Back to sign in</AuthLink>
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
