import { useRouter } from 'expo-router';
import { FittingList } from '@/components/fittings/fitting-list';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';

export default function FittingsScreen() {
  const router = useRouter();
  return (
    <Screen>
      <Button title="New fitting" variant="secondary" compact onPress={() => router.push('/fittings/new')} />
      <FittingList
        filters={{}}
        emptyTitle="No fittings yet"
        emptyMessage="A fitting is one appointment: a player, a date and a venue. Start one from here or from a player's page."
        emptyAction={<Button title="New fitting" onPress={() => router.push('/fittings/new')} />}
      />
    </Screen>
  );
}
