import { Redirect } from 'expo-router';
import { useMe } from '@/components/session/session-provider';
import { isStaff } from '@/components/session/permissions';

/** The start page depends on the role: staff see their players, a player their fittings. */
export default function StartScreen() {
  const me = useMe();
  return <Redirect href={isStaff(me.role) ? '/players' : '/my-fittings'} />;
}
