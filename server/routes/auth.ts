import { Router, type CookieOptions } from 'express';
import type { Config } from '../config';
import { actorOf, authenticate } from '../middleware/authenticate';
import { signInLimiter } from '../middleware/rate-limit';
import { signInBodySchema, updateMeBodySchema } from '../schemas';
import { describeMe, loadActor, signIn, signOutEverywhere, updateUnits } from '../services/auth';
import { SESSION_COOKIE, signSessionToken, ttlMs } from '../services/tokens';

export function authRouter(config: Config): Router {
  const router = Router();
  const cookie: CookieOptions = {
    httpOnly: true,
    secure: config.cookieSecure,
    sameSite: 'strict',
    path: '/api',
  };

  router.post('/auth/sign-in', signInLimiter(config), async (req, res) => {
    const body = signInBodySchema.parse(req.body);
    const user = await signIn(body);
    const token = signSessionToken(config, { sub: user.id, ver: user.tokenVersion });
    res.cookie(SESSION_COOKIE, token, { ...cookie, maxAge: ttlMs(config.jwt.ttl) });
    const actor = await loadActor(user.id, user.tokenVersion);
    res.json({ user: await describeMe(actor!) });
  });

  // Signing out clears this browser's cookie; it needs no valid session.
  router.post('/auth/sign-out', (_req, res) => {
    res.clearCookie(SESSION_COOKIE, cookie);
    res.status(204).end();
  });

  router.post('/auth/sign-out-everywhere', authenticate(config), async (_req, res) => {
    await signOutEverywhere(actorOf(res));
    res.clearCookie(SESSION_COOKIE, cookie);
    res.status(204).end();
  });

  router.get('/me', authenticate(config), async (_req, res) => {
    res.json(await describeMe(actorOf(res)));
  });

  router.patch('/me', authenticate(config), async (req, res) => {
    const body = updateMeBodySchema.parse(req.body);
    await updateUnits(actorOf(res), body.units);
    res.json(await describeMe(actorOf(res)));
  });

  return router;
}
