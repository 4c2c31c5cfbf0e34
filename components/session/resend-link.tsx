import { StyleSheet, View } from 'react-native';
import { errorMessage } from '../api-client';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { space } from '../theme';
import { useResendVerificationMutation } from './use-sign-up';

type ResendLinkProps = { email: string };

/** "Send the link again" for an address waiting for its confirmation. */
export function ResendLink({ email }: ResendLinkProps) {
  const resend = useResendVerificationMutation();
  return (
    <View style={styles.row}>
      <Button title="Send the link again" variant="secondary" onPress={() => resend.mutate(email)} busy={resend.isPending} />
      {resend.isSuccess ? <AppText tone="muted">Sent again, if that address is waiting for one. Look in your inbox (and spam).</AppText> : null}
      {resend.error ? <AppText tone="danger">{errorMessage(resend.error)}</AppText> : null}
    </View>
  );
}

const styles = StyleSheet.create({ row: { gap: space.sm } });
