import { useRouter } from 'expo-router';
import { canManageTeam } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { TeamList } from '@/components/team/team-list';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function TeamScreen() {
  const router = useRouter();
  const me = useMe();
  if (!canManageTeam(me.role)) {
    return (
      <Screen>
        <Notice tone="info">Only the shop owner manages the team.</Notice>
      </Screen>
    );
  }
  return (
    <Screen>
      <AppText tone="muted">The people who fit at {me.shop.name}. A deactivated fitter can no longer sign in.</AppText>
      <Button title="Add fitter" variant="secondary" compact onPress={() => router.push('/team/new')} />
      <Button title="Decision margins" variant="secondary" compact onPress={() => router.push('/team/margins')} />
      <TeamList selfId={me.id} />
    </Screen>
  );
}
