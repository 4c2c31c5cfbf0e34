import { Redirect } from 'expo-router';
import { useMe } from '@/components/session/session-provider';

/** The start page depends on the role: the owner sees the players, a fitter the fittings, a player their own fittings; the owner of a closed shop, the shop page. */
export default function StartScreen() {
  const me = useMe();
  if (me.shop.closedAt) return <Redirect href="/shop" />;
  return <Redirect href={me.role === 'owner' ? '/players' : me.role === 'fitter' ? '/fittings' : '/my-fittings'} />;
}
