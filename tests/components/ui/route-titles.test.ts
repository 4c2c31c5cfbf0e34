import { ROUTE_ACCESS } from '@/components/session/route-access';
import { ROUTE_TITLES, routeTitle } from '@/components/ui/route-titles';

describe('route titles', () => {
  it('ROUTE_TITLES, every signed-in page of the route table, has a plain title (a loading page never shows its file name)', () => {
    expect(Object.keys(ROUTE_ACCESS).filter((r) => !(r in ROUTE_TITLES))).toEqual([]);
    expect(Object.values(ROUTE_TITLES).filter((t) => /[[\]/]|index/.test(t))).toEqual([]);
  });

  it('routeTitle, a navigator route name with index and groups, finds the page title', () => {
    expect(routeTitle('fittings/[id]/index')).toBe('Fitting');
    expect(routeTitle('(tabs)/team')).toBe('Team');
    expect(routeTitle('players/[id]/bag-clubs/new')).toBe('Add a club');
  });

  it('routeTitle, a route not in the table, falls back to the product name', () => {
    expect(routeTitle('+not-found')).toBe('Ovalyard');
  });
});
