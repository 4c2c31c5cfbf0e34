import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { signInBodySchema } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { fieldErrorsFromZod, type FieldErrors } from '../forms';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { AuthLink } from './auth-link';
import { DemoHint } from './demo-hint';
import { useSignInMutation } from './use-sign-in';

type SignInFormProps = { onSignedIn: () => void };

function bannerFor(error: unknown): string {
  if (error instanceof ApiError && error.code === 'BAD_CREDENTIALS') return 'That e-mail and password do not match. Check both and try again.';
  return errorMessage(error);
}

/** E-mail and password; errors show in the page. */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const signIn = useSignInMutation();

  const submit = () => {
    const parsed = signInBodySchema.safeParse({ email, password });
    if (!parsed.success) {
      setFieldErrors(fieldErrorsFromZod(parsed.error));
      return;
    }
    setFieldErrors({});
    signIn.mutate(parsed.data, { onSuccess: onSignedIn });
  };

  return (
    <View style={styles.form}>
      <AppText variant="heading" accessibilityRole="header">
        Sign in
      </AppText>
      {signIn.error ? <Notice tone="danger">{bannerFor(signIn.error)}</Notice> : null}
      <TextField
        label="E-mail"
        value={email}
        onChangeText={setEmail}
        error={fieldErrors.email}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        inputMode="email"
        returnKeyType="next"
      />
      <TextField
        label="Password"
        value={password}
        onChangeText={setPassword}
        error={fieldErrors.password}
        secureTextEntry
        autoComplete="current-password"
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button title="Sign in" onPress={submit} busy={signIn.isPending} />
      <AuthLink href="/forgot">Forgot your password?</AuthLink>
      <DemoHint />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
