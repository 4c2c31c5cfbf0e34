import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { signUpBodySchema, type SignUpBody } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { parseWith, useTextForm } from '../use-text-form';
import { AuthLink } from './auth-link';
import { ResendLink } from './resend-link';
import { useSignUpMutation } from './use-sign-up';

/** A new shop and its owner; then "check your inbox" with a way to send the link again. */
export function SignUpForm() {
  const signUp = useSignUpMutation();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useTextForm(
    () => ({ shopName: '', name: '', email: '', password: '' }),
    parseWith(signUpBodySchema),
    (body: SignUpBody) => signUp.mutate(body, { onSuccess: () => setSentTo(body.email) }),
    signUp.error,
  );

  if (sentTo) {
    return (
      <View style={styles.form}>
        <AppText variant="heading" accessibilityRole="header">
          Check your inbox
        </AppText>
        <Notice tone="success">{`We sent a link to ${sentTo}. Open it within 48 hours to confirm your address; then sign in.`}</Notice>
        <ResendLink email={sentTo} />
        <AuthLink href="/sign-in">Go to sign in</AuthLink>
      </View>
    );
  }

  const banner = signUp.error && !form.shown.password ? errorMessage(signUp.error) : null;
  return (
    <View style={styles.form}>
      <AppText variant="heading" accessibilityRole="header">
        Start your shop
      </AppText>
      <AppText tone="muted">One account for the shop’s owner; you invite your fitters and players afterwards.</AppText>
      {banner ? <Notice tone="danger">{banner}</Notice> : null}
      <TextField label="Shop name" value={form.text.shopName} onChangeText={form.set('shopName')} error={form.shown.shopName} autoComplete="organization" />
      <TextField label="Your name" value={form.text.name} onChangeText={form.set('name')} error={form.shown.name} autoComplete="name" />
      <TextField
        label="E-mail"
        value={form.text.email}
        onChangeText={form.set('email')}
        error={form.shown.email}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        inputMode="email"
      />
      <TextField
        label="Password"
        value={form.text.password}
        onChangeText={form.set('password')}
        error={form.shown.password}
        hint="At least 10 characters; a few unrelated words work well."
        secureTextEntry
        autoComplete="new-password"
        returnKeyType="go"
        onSubmitEditing={form.submit}
      />
      <Button title="Create the shop" onPress={form.submit} busy={signUp.isPending} />
      <AuthLink href="/sign-in">Have an account? Sign in</AuthLink>
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
