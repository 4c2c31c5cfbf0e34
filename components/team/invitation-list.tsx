import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Invitation } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { useResendInvitationMutation, useRevokeInvitationMutation } from '../queries/invitations';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ConfirmStep } from '../ui/confirm-step';
import { colors, space } from '../theme';

type InvitationListProps = { invitations: readonly Invitation[] };

const day = (iso: string) => iso.slice(0, 10);

/** Open invitations, each with "Send again" and "Revoke" (asked once, in the page). */
export function InvitationList({ invitations }: InvitationListProps) {
  const resend = useResendInvitationMutation();
  const revoke = useRevokeInvitationMutation();
  const [asking, setAsking] = useState<string | null>(null);
  if (invitations.length === 0) return <AppText tone="muted">No open invitations.</AppText>;
  return (
    <View style={styles.list}>
      {resend.error ? <AppText tone="danger">{errorMessage(resend.error)}</AppText> : null}
      {invitations.map((inv) => (
        <View key={inv.id} style={styles.row}>
          <AppText variant="bodyStrong">{`${inv.name} · ${inv.email}`}</AppText>
          <AppText tone="muted">
            {inv.status === 'open' ? `Sent ${day(inv.sentAt)}, the link works until ${day(inv.expiresAt)}.` : `Sent ${day(inv.sentAt)}; the link has expired.`}
          </AppText>
          {asking === inv.id ? (
            <ConfirmStep
              question={`Revoke the invitation to ${inv.email}? Its link stops working.`}
              confirmTitle="Revoke"
              confirmLabel={`Revoke the invitation to ${inv.email}`}
              onConfirm={() => revoke.mutate(inv.id, { onSuccess: () => setAsking(null) })}
              onCancel={() => setAsking(null)}
              busy={revoke.isPending}
              error={revoke.error}
              errorTitle="Not revoked"
            />
          ) : (
            <View style={styles.actions}>
              <Button title="Send again" variant="secondary" compact busy={resend.isPending && resend.variables === inv.id} onPress={() => resend.mutate(inv.id)} accessibilityLabel={`Send the invitation to ${inv.email} again`} />
              <Button title="Revoke" variant="quiet" compact onPress={() => setAsking(inv.id)} accessibilityLabel={`Revoke the invitation to ${inv.email}`} />
            </View>
          )}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  row: { gap: space.xs, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.border },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
