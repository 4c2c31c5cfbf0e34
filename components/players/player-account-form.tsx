import { StyleSheet, View } from 'react-native';
import { playerAccountBodySchema, type Player } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { useGivePlayerAccountMutation } from '../queries/players';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { FirstSignInFields } from '../ui/first-sign-in-fields';
import { space } from '../theme';
import { parseWith, useTextForm } from '../use-text-form';

type PlayerAccountFormProps = { player: Player; onDone: () => void; onCancel: () => void };

function bannerFor(error: unknown): string {
  if (error instanceof ApiError && error.code === 'EMAIL_TAKEN') return 'That e-mail address already has a sign-in. Use another.';
  if (error instanceof ApiError && error.code === 'HAS_ACCOUNT') return 'This player already has a sign-in.';
  return errorMessage(error);
}

/** Gives a player their own sign-in: an e-mail and a first password to hand over. */
export function PlayerAccountForm({ player, onDone, onCancel }: PlayerAccountFormProps) {
  const give = useGivePlayerAccountMutation(player.id);
  // mutateAsync, not mutate's callbacks: the saved player (hasAccount) may unmount this form
  // before per-call callbacks would run. A failure shows through give.error.
  const { text, set, shown, submit } = useTextForm(
    () => ({ email: player.email ?? '', password: '' }),
    parseWith(playerAccountBodySchema),
    (body) => void give.mutateAsync(body).then(onDone, () => undefined),
    give.error,
  );

  return (
    <View style={styles.form}>
      <AppText tone="muted">
        {player.name} will sign in with this e-mail and password and see only their own profile and fittings. Hand the
        password over in person; they can keep using it.
      </AppText>
      {give.error ? <Notice tone="danger">{bannerFor(give.error)}</Notice> : null}
      <FirstSignInFields email={text.email} password={text.password} onChange={set} errors={shown} />
      <View style={styles.actions}>
        <Button title="Give sign-in" onPress={submit} busy={give.isPending} />
        <Button title="Cancel" variant="quiet" onPress={onCancel} disabled={give.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
