import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { FittingForm } from '@/components/fittings/fitting-form';
import { useGoBack } from '@/components/navigation';
import { useCreateFittingMutation } from '@/components/queries/fittings';
import { Screen } from '@/components/ui/screen';

export default function NewFittingScreen() {
  const { playerId } = useLocalSearchParams<{ playerId?: string }>();
  const router = useRouter();
  const goBack = useGoBack('/fittings');
  const create = useCreateFittingMutation();
  return (
    <Screen>
      <Stack.Screen options={{ title: 'New fitting' }} />
      <FittingForm
        playerId={playerId}
        submitTitle="Create fitting"
        busy={create.isPending}
        error={create.error}
        onCancel={goBack}
        onSubmit={(body) =>
          create.mutate(body, { onSuccess: (f) => router.replace({ pathname: '/fittings/[id]', params: { id: f.id } }) })
        }
      />
    </Screen>
  );
}
