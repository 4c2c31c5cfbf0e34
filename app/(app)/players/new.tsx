import { Stack, useRouter } from 'expo-router';
import { useGoBack } from '@/components/navigation';
import { PlayerForm } from '@/components/players/player-form';
import { useCreatePlayerMutation } from '@/components/queries/players';
import { Screen } from '@/components/ui/screen';

export default function NewPlayerScreen() {
  const router = useRouter();
  const goBack = useGoBack('/players');
  const create = useCreatePlayerMutation();
  return (
    <Screen>
      <Stack.Screen options={{ title: 'New player' }} />
      <PlayerForm
        submitTitle="Add player"
        busy={create.isPending}
        error={create.error}
        onCancel={goBack}
        onSubmit={(body) =>
          create.mutate(body, { onSuccess: (p) => router.replace({ pathname: '/players/[id]', params: { id: p.id } }) })
        }
      />
    </Screen>
  );
}
