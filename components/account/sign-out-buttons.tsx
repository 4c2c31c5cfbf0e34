import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { errorMessage } from '../api-client';
import { useSignOutMutation } from '../session/use-sign-out';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { space } from '../theme';

/** Sign out here, or on every device (ends every session of this account). */
export function SignOutButtons() {
  const router = useRouter();
  const signOut = useSignOutMutation();
  const run = (everywhere: boolean) => signOut.mutate({ everywhere }, { onSuccess: () => router.replace('/sign-in') });
  return (
    <View style={styles.box}>
      <View style={styles.row}>
        <Button title="Sign out" onPress={() => run(false)} busy={signOut.isPending && signOut.variables?.everywhere === false} />
        <Button
          title="Sign out everywhere"
          variant="danger"
          onPress={() => run(true)}
          busy={signOut.isPending && signOut.variables?.everywhere === true}
        />
      </View>
      <AppText variant="caption" tone="muted">
        “Sign out everywhere” also ends your sessions on other phones and computers.
      </AppText>
      {signOut.error ? (
        <AppText variant="caption" tone="danger" accessibilityRole="alert">
          {errorMessage(signOut.error)}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
