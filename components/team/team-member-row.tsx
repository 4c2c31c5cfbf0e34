import { StyleSheet, View } from 'react-native';
import type { TeamMember } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { formatRole } from '../format';
import { useUpdateTeamMemberMutation } from '../queries/team';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { colors, radius, space } from '../theme';

type TeamMemberRowProps = { member: TeamMember; isSelf: boolean };

/** A member of the shop; an owner can deactivate or reactivate a fitter. */
export function TeamMemberRow({ member, isSelf }: TeamMemberRowProps) {
  const update = useUpdateTeamMemberMutation();
  const canToggle = member.role === 'fitter' && !isSelf;
  return (
    <Card>
      <View style={styles.top}>
        <View style={styles.who}>
          <AppText variant="bodyStrong" numberOfLines={1}>
            {member.name}
            {isSelf ? ' (you)' : ''}
          </AppText>
          <AppText variant="caption" tone="muted" numberOfLines={1}>
            {member.email}
          </AppText>
        </View>
        <View style={[styles.status, member.active ? styles.active : styles.inactive]}>
          <AppText variant="label" style={{ color: member.active ? colors.success : colors.textMuted }}>
            {member.active ? formatRole(member.role) : 'Deactivated'}
          </AppText>
        </View>
      </View>
      {canToggle ? (
        <Button
          title={member.active ? 'Deactivate' : 'Reactivate'}
          accessibilityLabel={`${member.active ? 'Deactivate' : 'Reactivate'} ${member.name}`}
          variant={member.active ? 'danger' : 'secondary'}
          compact
          busy={update.isPending}
          onPress={() => update.mutate({ id: member.id, active: !member.active })}
        />
      ) : null}
      {update.error ? (
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
