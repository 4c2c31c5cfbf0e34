import { Stack, useLocalSearchParams } from 'expo-router';
import { BagView } from '@/components/bag/bag-view';
import { usePlayerQuery } from '@/components/queries/players';
import { Screen } from '@/components/ui/screen';

/** /players/:id/bag — a player's bag (staff, and the player themself). */
export default function PlayerBagScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const player = usePlayerQuery(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: player.data ? `${player.data.name}’s bag` : 'Bag' }} />
      <BagView playerId={id} />
    </Screen>
  );
}
