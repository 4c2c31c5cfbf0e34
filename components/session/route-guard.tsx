import { Redirect } from 'expo-router';
import type { ReactElement, ReactNode } from 'react';
import { mayOpenRoute } from './route-access';
import { useMe } from './session-provider';

type RouteGuardProps = { routeName: string; children: ReactNode };

/**
 * A navigator's screen layout: the screen, or — for a role the route table keeps out — a redirect
 * to the start page. Inside the navigator, so the navigator stays mounted and the redirect lands.
 */
export function RouteGuard({ routeName, children }: RouteGuardProps): ReactElement {
  const me = useMe();
  if (!mayOpenRoute(me.role, routeName)) return <Redirect href="/" />;
  // a closed shop's owner may open only the shop page (the server refuses the rest)
  if (me.shop.closedAt && routeName !== 'shop' && routeName !== 'index') return <Redirect href="/shop" />;
  return <>{children}</>;
}

/** For a navigator's `screenLayout` prop. */
export function guardedScreen({ route, children }: { route: { name: string }; children: ReactElement }): ReactElement {
  return <RouteGuard routeName={route.name}>{children}</RouteGuard>;
}
