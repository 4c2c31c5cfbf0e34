/**
 * A plain title for each signed-in page by its route (as in components/session/route-access.ts),
 * shown in the header until the page sets its own (a fitting's player and date, once loaded), so a
 * loading page never shows its file name.
 */
export const ROUTE_TITLES: Readonly<Record<string, string>> = {
  '/': 'Ovalyard',
  '/account': 'Account',
  '/players': 'Players',
  '/players/new': 'New player',
  '/players/[id]': 'Player',
  '/players/[id]/edit': 'Edit player',
  '/players/[id]/account': 'Sign-in',
  '/fittings': 'Fittings',
  '/fittings/new': 'New fitting',
  '/fittings/[id]': 'Fitting',
  '/fittings/[id]/edit': 'Edit fitting',
  '/fittings/[id]/import': 'Import a bay file',
  '/bay-files/[id]/remap': 'Change mapping',
  '/builds/[id]/edit': 'Edit build',
  '/my-fittings': 'My fittings',
  '/team': 'Team',
  '/team/new': 'Add fitter',
  '/team/margins': 'Decision margins',
  '/recipes': 'Import recipes',
  '/recipes/[id]': 'Import recipe',
  '/players/[id]/bag': 'Bag',
  '/players/[id]/bag-clubs/new': 'Add a club',
  '/bag-clubs/[id]': 'Club in the bag',
  '/bag-clubs/[id]/edit': 'Edit club',
  '/my-bag': 'My bag',
  '/fittings/[id]/spec-sheet': 'Spec sheet',
  '/spec-sheets/[id]': 'Spec sheet',
  '/workshop-settings': 'Workshop settings',
  '/fittings/[id]/intake': 'Intake',
  '/fittings/[id]/messages': 'Messages',
  '/shop': 'Shop',
};

/**
 * The title of a navigator's route name ("fittings/[id]/index", "team"): its route with "/index"
 * and the groups left out; "Ovalyard" for a route without one.
 * @example routeTitle('fittings/[id]/index') // => 'Fitting'
 */
export function routeTitle(routeName: string): string {
  const route = '/' + routeName.split('/').filter((s) => s !== 'index' && !(s.startsWith('(') && s.endsWith(')'))).join('/');
  return ROUTE_TITLES[route] ?? 'Ovalyard';
}
