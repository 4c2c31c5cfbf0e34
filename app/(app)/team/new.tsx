import { Stack } from 'expo-router';
import { useGoBack } from '@/components/navigation';
import { TeamMemberForm } from '@/components/team/team-member-form';
import { Screen } from '@/components/ui/screen';

export default function AddFitterScreen() {
  const goBack = useGoBack('/team');
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Add fitter' }} />
      <TeamMemberForm onDone={goBack} onCancel={goBack} />
    </Screen>
  );
}
