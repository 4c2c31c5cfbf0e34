import type { Role } from '@/server/schemas';

const EVERYONE: readonly Role[] = ['owner', 'fitter', 'player'];
const STAFF: readonly Role[] = ['owner', 'fitter'];
const OWNER: readonly Role[] = ['owner'];
const PLAYER: readonly Role[] = ['player'];

/**
 * Who may open each signed-in page, by its route as Expo Router names it (groups left out).
 * A page a role may not open sends it to its start page. Convenience only: the server checks
 * every request again (a player opening another player's page gets a 404 from it). The import
 * page also sends a player home from a fitting that is not remote (only the data can say).
 */
export const ROUTE_ACCESS: Readonly<Record<string, readonly Role[]>> = {
  '/': EVERYONE,
  '/account': EVERYONE,
  '/players': STAFF,
  '/players/new': STAFF,
  '/players/[id]': EVERYONE,
  '/players/[id]/edit': STAFF,
  '/players/[id]/account': STAFF,
  '/fittings': STAFF,
  '/fittings/new': STAFF,
  '/fittings/[id]': EVERYONE,
  '/fittings/[id]/edit': STAFF,
  '/fittings/[id]/import': EVERYONE,
  '/fittings/[id]/intake': EVERYONE,
  '/fittings/[id]/messages': EVERYONE,
  '/bay-files/[id]/remap': STAFF,
  '/builds/[id]/edit': STAFF,
  '/my-fittings': PLAYER,
  '/team': OWNER,
  '/team/new': OWNER,
  '/team/margins': OWNER,
  '/recipes': OWNER,
  '/recipes/[id]': OWNER,
  '/players/[id]/bag': EVERYONE,
  // a player keeps their own bag (the server refuses another's)
  '/players/[id]/bag-clubs/new': EVERYONE,
  '/bag-clubs/[id]': EVERYONE,
  '/bag-clubs/[id]/edit': EVERYONE,
  '/my-bag': PLAYER,
  '/fittings/[id]/spec-sheet': EVERYONE,
  '/spec-sheets/[id]': EVERYONE,
  '/workshop-settings': STAFF,
  '/shop': OWNER,
};

/**
 * The route of the current segments with the groups left out.
 * @example routeOf(['(app)', '(tabs)', 'players']) // => '/players'
 */
export function routeOf(segments: readonly string[]): string {
  return '/' + segments.filter((s) => !(s.startsWith('(') && s.endsWith(')'))).join('/');
}

/**
 * Whether a role may open a navigator's route by its name ("players/new", "fittings/[id]/index",
 * "(tabs)", a tab's "team"): its route with "/index" and the groups left out.
 * @example mayOpenRoute('fitter', 'team') // => false
 */
export function mayOpenRoute(role: Role, routeName: string): boolean {
  return mayOpen(role, routeName.split('/').filter((s) => s !== 'index'));
}

/**
 * Whether a role may open the page at these segments. Routes not in the table (the not-found
 * page) are open: they show nothing of anyone's.
 * @example mayOpen('player', ['(app)', '(tabs)', 'players']) // => false
 */
export function mayOpen(role: Role, segments: readonly string[]): boolean {
  const roles = ROUTE_ACCESS[routeOf(segments)];
  return roles === undefined || roles.includes(role);
}
