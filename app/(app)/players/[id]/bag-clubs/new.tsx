import { Stack, useLocalSearchParams } from 'expo-router';
import { BagClubForm } from '@/components/bag/bag-club-form';
import { useGoBack } from '@/components/navigation';
import { useAddBagClubMutation } from '@/components/queries/bags';
import { useMe } from '@/components/session/session-provider';
import { Screen } from '@/components/ui/screen';

/** /players/:id/bag-clubs/new — a club goes in the player's bag (staff). */
export default function NewBagClubScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const me = useMe();
  const goBack = useGoBack({ pathname: '/players/[id]/bag', params: { id } });
  const add = useAddBagClubMutation(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Add a club' }} />
      <BagClubForm units={me.units} busy={add.isPending} error={add.error} onCancel={goBack} onSubmit={(body) => add.mutate(body, { onSuccess: goBack })} />
    </Screen>
  );
}
