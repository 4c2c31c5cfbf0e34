import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';
import { errorMessage } from '../api-client';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { space } from '../theme';
import { AuthLink } from './auth-link';
import { useVerifyEmailMutation } from './use-sign-up';

type VerifyEmailProps = { token: string | undefined; onSignIn: () => void };

/** Confirms the address of the link once, on opening; then on to sign in. */
export function VerifyEmail({ token, onSignIn }: VerifyEmailProps) {
  const verify = useVerifyEmailMutation();
  const { mutate } = verify;
  useEffect(() => {
    if (token) mutate(token);
  }, [token, mutate]);

  return (
    <View style={styles.form}>
      <AppText variant="heading" accessibilityRole="header">
        Confirm your e-mail
      </AppText>
      {token && verify.isPending ? <LoadingState label="Confirming…" /> : null}
      {verify.isSuccess ? (
        <>
          <Notice tone="success">Your address is confirmed. Sign in to open your shop.</Notice>
          <Button title="Sign in" onPress={onSignIn} />
        </>
      ) : null}
      {!token || verify.isError ? (
        <Notice tone="danger">
          <AppText>{verify.error ? errorMessage(verify.error) : 'This link is incomplete. Open the whole link from the message.'}</AppText>
          <AuthLink href="/sign-in" align="start">
            Sign in to have a new one sent
          </AuthLink>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
