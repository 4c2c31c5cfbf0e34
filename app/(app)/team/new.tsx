import { Stack } from 'expo-router';
import { useGoBack } from '@/components/navigation';
import { InviteFitterForm } from '@/components/team/invite-fitter-form';
import { Screen } from '@/components/ui/screen';

export default function InviteFitterScreen() {
  const goBack = useGoBack('/team');
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Invite a fitter' }} />
      <InviteFitterForm onDone={goBack} onCancel={goBack} />
    </Screen>
  );
}
