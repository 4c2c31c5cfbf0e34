import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { TeamMember } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { formatRole } from '../format';
import { useUpdateTeamMemberMutation } from '../queries/team';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ConfirmStep } from '../ui/confirm-step';
import { EmailText } from '../ui/email-text';
import { colors, radius, space } from '../theme';

type TeamMemberRowProps = { member: TeamMember; isSelf: boolean };

/**
 * A member of the shop; an owner can deactivate a fitter (after a question in the page: their
 * sessions end and they can no longer sign in) or reactivate one (at once).
 */
export function TeamMemberRow({ member, isSelf }: TeamMemberRowProps) {
  const update = useUpdateTeamMemberMutation();
  const [confirming, setConfirming] = useState(false);
  const canToggle = member.role === 'fitter' && !isSelf;
  const setActive = (active: boolean) => update.mutate({ id: member.id, active }, { onSuccess: () => setConfirming(false) });
  return (
    <Card>
      <View style={styles.top}>
        <View style={styles.who}>
          <AppText variant="bodyStrong" numberOfLines={1}>
            {member.name}
            {isSelf ? ' (you)' : ''}
          </AppText>
          <EmailText email={member.email} variant="caption" tone="muted" />
        </View>
        <View style={[styles.status, member.active ? styles.active : styles.inactive]}>
          <AppText variant="label" style={{ color: member.active ? colors.success : colors.textMuted }}>
            {member.active ? formatRole(member.role) : 'Deactivated'}
          </AppText>
        </View>
      </View>
      {canToggle && confirming ? (
        <ConfirmStep
          question={`Deactivate ${member.name}? They are signed out everywhere and can no longer sign in. Their fittings stay with the shop; you can reactivate them later.`}
          confirmTitle="Deactivate"
          confirmLabel={`Yes, deactivate ${member.name}`}
          onConfirm={() => setActive(false)}
          onCancel={() => {
            setConfirming(false);
            update.reset();
          }}
          busy={update.isPending}
          error={update.error}
          errorTitle="Not deactivated"
        />
      ) : null}
      {canToggle && !confirming ? (
        <Button
          title={member.active ? 'Deactivate' : 'Reactivate'}
          accessibilityLabel={`${member.active ? 'Deactivate' : 'Reactivate'} ${member.name}`}
          variant={member.active ? 'danger' : 'secondary'}
          compact
          busy={update.isPending}
          onPress={() => (member.active ? setConfirming(true) : setActive(true))}
        />
      ) : null}
      {update.error && !confirming ? (
        <AppText variant="caption" tone="danger" accessibilityRole="alert">
          {errorMessage(update.error)}
        </AppText>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md },
  who: { flexShrink: 1, gap: 2 },
  status: { borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 2 },
  active: { backgroundColor: colors.successSoft },
  inactive: { backgroundColor: colors.surfaceSunk },
});
