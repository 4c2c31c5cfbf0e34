import { StyleSheet, View } from 'react-native';
import { playerInvitationBodySchema, type Player } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { useInvitePlayerMutation, usePlayerInvitationsQuery } from '../queries/invitations';
import { InvitationList } from '../team/invitation-list';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { parseWith, useTextForm } from '../use-text-form';

type PlayerInvitationProps = { player: Player };

/** Staff invite a player to sign in (a link by e-mail; no password handed over) and see the open invitation. */
export function PlayerInvitation({ player }: PlayerInvitationProps) {
  const invite = useInvitePlayerMutation(player.id);
  const open = usePlayerInvitationsQuery(player.id);
  const { text, set, shown, submit } = useTextForm(
    () => ({ email: player.email ?? '' }),
    parseWith(playerInvitationBodySchema),
    (body) => invite.mutate(body),
    invite.error,
  );
  return (
    <View style={styles.page}>
      <AppText tone="muted">{`${player.name} gets a link by e-mail (valid 7 days), chooses a password and sees their own fittings, bag and spec sheets.`}</AppText>
      {invite.isSuccess ? <Notice tone="success">{`Invitation sent to ${invite.data.email}.`}</Notice> : null}
      {invite.error && !shown.email ? <Notice tone="danger">{errorMessage(invite.error)}</Notice> : null}
      <TextField label="E-mail" value={text.email} onChangeText={set('email')} error={shown.email} autoCapitalize="none" keyboardType="email-address" inputMode="email" />
      <Button title="Send the invitation" onPress={submit} busy={invite.isPending} />
      <Section title="Open invitations">{open.data ? <InvitationList invitations={open.data} /> : null}</Section>
    </View>
  );
}

const styles = StyleSheet.create({ page: { gap: space.lg } });
