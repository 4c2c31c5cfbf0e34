import fs from 'node:fs';
import path from 'node:path';
import { mayOpen, mayOpenRoute, ROUTE_ACCESS, routeOf } from '@/components/session/route-access';

/** Every screen file under app/(app), as its route ("(tabs)/players.tsx" → "/players", "index.tsx" → "/"). */
function screenRoutes(): string[] {
  const root = path.resolve(__dirname, '../../../app/(app)');
  const routes: string[] = [];
  const walk = (dir: string, segments: string[]) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      if (entry.isDirectory()) walk(path.join(dir, entry.name), [...segments, entry.name]);
      else if (entry.name.endsWith('.tsx') && entry.name !== '_layout.tsx') {
        const name = entry.name.replace(/\.tsx$/, '');
        routes.push(routeOf(name === 'index' ? segments : [...segments, name]));
      }
    }
  };
  walk(root, []);
  return routes.sort();
}

describe('route access', () => {
  it('ROUTE_ACCESS, every signed-in screen file, has its row (a new screen must say who may open it)', () => {
    expect(screenRoutes().filter((r) => !(r in ROUTE_ACCESS))).toEqual([]);
    expect(Object.keys(ROUTE_ACCESS).filter((r) => !screenRoutes().includes(r))).toEqual([]);
  });

  it('routeOf, segments with groups, leaves the groups out', () => {
    expect(routeOf(['(app)', '(tabs)', 'players'])).toBe('/players');
    expect(routeOf(['(app)', 'fittings', '[id]', 'edit'])).toBe('/fittings/[id]/edit');
    expect(routeOf(['(app)'])).toBe('/');
  });

  it('mayOpen, the staff list for a player and the player list for staff, says no', () => {
    expect(mayOpen('player', ['(app)', '(tabs)', 'players'])).toBe(false);
    expect(mayOpen('fitter', ['(app)', '(tabs)', 'my-fittings'])).toBe(false);
    expect(mayOpen('fitter', ['(app)', '(tabs)', 'team'])).toBe(false);
    expect(mayOpen('owner', ['(app)', '(tabs)', 'team'])).toBe(true);
    expect(mayOpen('player', ['(app)', 'fittings', '[id]'])).toBe(true);
  });

  it('mayOpenRoute, navigator route names with index and groups, reads them as their routes', () => {
    expect(mayOpenRoute('player', 'fittings/[id]/index')).toBe(true);
    expect(mayOpenRoute('player', 'fittings/[id]/edit')).toBe(false);
    expect(mayOpenRoute('player', '(tabs)')).toBe(true);
    expect(mayOpenRoute('fitter', 'team')).toBe(false);
    expect(mayOpenRoute('fitter', 'recipes/index')).toBe(false);
    expect(mayOpenRoute('owner', 'recipes/[id]')).toBe(true);
  });

  it('mayOpen, a route not in the table (the not-found page), lets everyone see it', () => {
    expect(mayOpen('player', ['+not-found'])).toBe(true);
  });
});
