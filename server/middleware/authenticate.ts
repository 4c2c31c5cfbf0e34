import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { Config } from '../config';
import { HttpError, unauthenticated } from '../errors';
import type { Actor } from '../services/actor';
import { loadActor } from '../services/auth';
import { SESSION_COOKIE, verifySessionToken } from '../services/tokens';

const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
/** Header every state-changing request from the web app carries; a cross-site form cannot set it. */
export const CSRF_HEADER = 'x-ovalyard-request';

function tokenOf(req: Request): { token: string; fromCookie: boolean } | null {
  const header = req.get('authorization');
  if (header?.startsWith('Bearer ')) return { token: header.slice(7).trim(), fromCookie: false };
  const cookie = (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  return cookie ? { token: cookie, fromCookie: true } : null;
}

/**
 * Requires a signed-in user: a session cookie (web) or a Bearer token (scripts). Puts the actor
 * in res.locals.actor. Cookie-authenticated unsafe requests must carry the CSRF header.
 */
export function authenticate(config: Config): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    const found = tokenOf(req);
    if (!found) throw unauthenticated();
    const claims = verifySessionToken(config, found.token);
    if (found.fromCookie && UNSAFE.has(req.method) && req.get(CSRF_HEADER) !== '1') {
      throw new HttpError(403, 'CSRF_HEADER_MISSING', 'This request is missing its app header.');
    }
    const actor = await loadActor(claims.sub, claims.ver, claims.sid);
    if (!actor) throw unauthenticated('Your session has ended. Sign in again.');
    res.locals.actor = actor;
    next();
  };
}

/** The actor that authenticate() put on this response. */
export function actorOf(res: Response): Actor {
  const actor = res.locals.actor as Actor | undefined;
  if (!actor) throw unauthenticated();
  return actor;
}
