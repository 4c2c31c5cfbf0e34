import { BagView } from '@/components/bag/bag-view';
import { useMe } from '@/components/session/session-provider';
import { EmptyState } from '@/components/ui/empty-state';
import { Screen } from '@/components/ui/screen';

/** A player's own bag. */
export default function MyBagScreen() {
  const me = useMe();
  return <Screen>{me.playerId ? <BagView playerId={me.playerId} /> : <EmptyState title="No bag here" message="Bags belong to players." />}</Screen>;
}
