import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { errorMessage } from '../api-client';
import { useRequestFittingMutation, useRequestPageQuery } from '../queries/fitting-course';
import { useSession } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { TextField } from '../ui/text-field';

type RequestPanelProps = { slug: string };

/**
 * A shop's public request page: anyone sees the shop's name; a signed-in player of the shop asks
 * for a remote fitting and goes on to the intake; anyone else is asked to sign in.
 */
export function RequestPanel({ slug }: RequestPanelProps) {
  const router = useRouter();
  const session = useSession();
  const page = useRequestPageQuery(slug);
  const ask = useRequestFittingMutation(slug);
  const [note, setNote] = useState('');
  if (page.isPending || session.status === 'loading') return <LoadingState label="Opening the page…" />;
  if (page.isError) return <ErrorState error={page.error} title="This request page does not exist" />;
  const me = session.me;
  return (
    <View style={styles.box}>
      <AppText variant="heading" accessibilityRole="header">{`A remote fitting with ${page.data.shopName}`}</AppText>
      <AppText tone="muted">You answer a short intake on your phone, add your bag and send your own launch-monitor files; your fitter recommends builds and the workshop makes them.</AppText>
      {!me ? (
        <>
          <AppText>Sign in with the account your fitting shop gave you to ask for one.</AppText>
          <Button title="Sign in" onPress={() => router.push(`/sign-in?next=${encodeURIComponent(`/request/${slug}`)}`)} />
        </>
      ) : me.role !== 'player' ? (
        <AppText tone="muted">This page is for your shop’s players: share its address with them.</AppText>
      ) : (
        <>
          <TextField label="Anything your fitter should know first (optional)" value={note} onChangeText={setNote} multiline numberOfLines={3} maxLength={1000} />
          {ask.error ? <AppText tone="danger">{errorMessage(ask.error)}</AppText> : null}
          <Button
            title="Ask for a remote fitting"
            busy={ask.isPending}
            onPress={() => ask.mutate(note, { onSuccess: (f) => router.replace({ pathname: '/fittings/[id]/intake', params: { id: f.id } }) })}
          />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.lg } });
