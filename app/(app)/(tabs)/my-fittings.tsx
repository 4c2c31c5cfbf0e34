import { FittingList } from '@/components/fittings/fitting-list';
import { useMe } from '@/components/session/session-provider';
import { AppText } from '@/components/ui/app-text';
import { Screen } from '@/components/ui/screen';

/** A player's own fittings (the server shows a player nothing else). */
export default function MyFittingsScreen() {
  const me = useMe();
  return (
    <Screen>
      <AppText tone="muted">Your fittings at {me.shop.name}. Open one to see your shots, where they landed and the builds you tried.</AppText>
      <FittingList
        filters={me.playerId ? { playerId: me.playerId } : {}}
        showPlayer={false}
        emptyTitle="No fittings yet"
        emptyMessage="When your fitter books a fitting for you, it appears here."
      />
    </Screen>
  );
}
