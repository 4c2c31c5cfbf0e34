import { Router, type CookieOptions } from 'express';
import type { Config } from '../config';
import { actorOf, authenticate } from '../middleware/authenticate';
import { signInLimiter } from '../middleware/rate-limit';
import { forgotBodySchema, resetBodySchema, signInBodySchema, updateMeBodySchema } from '../schemas';
import type { Mailer } from '../services/mailer';
import { requestPasswordReset, resetPassword } from '../services/password-resets';
import { describeMe, loadActor, signIn, signOutEverywhere, updateUnits } from '../services/auth';
import { SESSION_COOKIE, signSessionToken, ttlMs } from '../services/tokens';

export function authRouter(config: Config, mailer: Mailer): Router {
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
    // Analysis answers may be kept by the browser for revalidation (private, no-cache): dropped
    // here, so the next person on this device finds none of them (W3C Clear Site Data).
    res.set('Clear-Site-Data', '"cache"');
    res.status(204).end();
  });

  // The same answer whether or not the account exists; rate-limited like sign-in.
  router.post('/auth/forgot', signInLimiter(config), async (req, res) => {
    const { email } = forgotBodySchema.parse(req.body);
    // The link goes to the configured address; without one, to the address this request came to.
    const appUrl = config.appUrl ?? `${req.protocol}://${req.get('host')}`;
    await requestPasswordReset(email, appUrl, mailer);
    res.status(204).end();
  });

  router.post('/auth/reset', signInLimiter(config), async (req, res) => {
    const { token, password } = resetBodySchema.parse(req.body);
    await resetPassword(token, password);
    res.status(204).end();
  });

  router.post('/auth/sign-out-everywhere', authenticate(config), async (_req, res) => {
    await signOutEverywhere(actorOf(res));
    res.clearCookie(SESSION_COOKIE, cookie);
    // Analysis answers may be kept by the browser for revalidation (private, no-cache): dropped
    // here, so the next person on this device finds none of them (W3C Clear Site Data).
    res.set('Clear-Site-Data', '"cache"');
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
