/**
 * Every route an Express app answers, read from its router stack (Express 5 / router 2: a layer
 * keeps its mount path in `rawPath`, a route its methods). Used by the authorisation matrix so
 * a route added anywhere without a row there fails the test.
 */
import type { Express } from 'express';

interface Layer {
  rawPath?: string | string[];
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** `METHOD /path` for every route, e.g. `GET /api/fittings/:id`. */
export function listRoutes(app: Express): string[] {
  const found: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on && method !== '_all') found.push(`${method.toUpperCase()} ${join(prefix, layer.route.path)}`);
        }
      } else if (layer.handle?.stack) {
        const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
        walk(layer.handle.stack, join(prefix, mount));
      }
    }
  };
  walk(((app as unknown as { router: { stack: Layer[] } }).router).stack, '');
  return [...new Set(found)].sort();
}

function join(a: string, b: string): string {
  const joined = `${a}/${b}`.replace(/\/+/g, '/');
  return joined.length > 1 ? joined.replace(/\/$/, '') : joined;
}
