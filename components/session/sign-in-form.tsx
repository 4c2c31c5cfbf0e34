import { useEffect, useState } from 'react';
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
import { DEMO_SIGN_IN, DemoHint } from './demo-hint';
import { ResendLink } from './resend-link';
import { useSignInMutation } from './use-sign-in';

type SignInFormProps = {
  onSignedIn: () => void;
  /** The server has the invented demo loaded: show its sign-ins and pre-fill the fitter's. */
  demo?: boolean;
};

function bannerFor(error: unknown): string {
  if (error instanceof ApiError && error.code === 'BAD_CREDENTIALS') return 'That e-mail and password do not match. Check both and try again.';
  if (error instanceof ApiError && error.code === 'EMAIL_NOT_VERIFIED') return 'Confirm your e-mail address first: open the link we sent you.';
  return errorMessage(error);
}

/**
 * E-mail and password; errors show in the page. Editing a field after a refusal takes the old
 * refusal away (it spoke of what was typed before).
 */
export function SignInForm({ onSignedIn, demo = false }: SignInFormProps) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const signIn = useSignInMutation();

  // The demo answer comes after the first paint: fill in only what nobody has typed into yet.
  useEffect(() => {
    if (!demo) return;
    setEmail((e) => e || DEMO_SIGN_IN.email);
    setPassword((p) => p || DEMO_SIGN_IN.password);
  }, [demo]);

  const edit = (set: (value: string) => void) => (value: string) => {
    set(value);
    if (signIn.error) signIn.reset();
  };

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
      {signIn.error instanceof ApiError && signIn.error.code === 'EMAIL_NOT_VERIFIED' ? <ResendLink email={email.trim().toLowerCase()} /> : null}
      <TextField
        label="E-mail"
        value={email}
        onChangeText={edit(setEmail)}
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
        onChangeText={edit(setPassword)}
        error={fieldErrors.password}
        secureTextEntry
        autoComplete="current-password"
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button title="Sign in" onPress={submit} busy={signIn.isPending} />
      <AuthLink href="/forgot">Forgot your password?</AuthLink>
      <AuthLink href="/sign-up">New shop? Start here</AuthLink>
      {demo ? <DemoHint /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
