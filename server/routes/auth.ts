import { Router, type CookieOptions, type Request, type Response } from 'express';
import type { Config } from '../config';
import { actorOf, authenticate } from '../middleware/authenticate';
import { consumeOrRefuse, limitByAddress, refuseWhenSpent, type RateLimits } from '../middleware/rate-limit';
import { acceptInvitationBodySchema, forgotBodySchema, invitationTokenBodySchema, resendVerificationBodySchema, resetBodySchema, signInBodySchema, signUpBodySchema, updateMeBodySchema, verifyBodySchema } from '../schemas';
import { acceptInvitation, previewInvitation } from '../services/invitations';
import { resendVerification, signUp, verifyEmail } from '../services/sign-up';
import type { User } from '../models';
import type { Mailer } from '../services/mailer';
import { requestPasswordReset, resetPassword } from '../services/password-resets';
import { describeMe, loadActor, signIn, signOutEverywhere, updateUnits } from '../services/auth';
import { endSession, pruneSessions, startSession } from '../services/sessions';
import { readSessionToken, SESSION_COOKIE, signSessionToken, ttlMs } from '../services/tokens';
import { HttpError } from '../errors';

/** Whether cookies of this request get the Secure flag (see Config.cookieSecure). */
export function secureCookies(config: Config, req: Request): boolean {
  if (config.cookieSecure !== 'auto') return config.cookieSecure;
  return req.secure || config.appUrl.startsWith('https:');
}

export function authRouter(config: Config, mailer: Mailer, limits: RateLimits): Router {
  const router = Router();
  const cookie = (req: Request): CookieOptions => ({ httpOnly: true, secure: secureCookies(config, req), sameSite: 'strict', path: '/api' });
  /** A new session for a user: the cookie set, their description answered. */
  const startSignedIn = async (req: Request, res: Response, user: User) => {
    const ttl = ttlMs(config.jwt.ttl);
    await pruneSessions(user.id);
    const session = await startSession(user.id, ttl);
    const token = signSessionToken(config, { sub: user.id, ver: user.tokenVersion, sid: session.id });
    res.cookie(SESSION_COOKIE, token, { ...cookie(req), maxAge: ttl });
    const actor = await loadActor(user.id, user.tokenVersion, session.id);
    return describeMe(actor!);
  };
  const tokenOf = (req: Request): string | undefined => {
    const header = req.get('authorization');
    if (header?.startsWith('Bearer ')) return header.slice(7).trim();
    return (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  };

  router.post('/auth/sign-in', limitByAddress(limits, 'sign-in attempts from your address'), async (req, res) => {
    const body = signInBodySchema.parse(req.body);
    const account = body.email;
    await refuseWhenSpent(limits.failedByAccount, account, 'failed sign-ins on this account', res);
    let user;
    try {
      user = await signIn(body);
    } catch (err) {
      if (err instanceof HttpError && err.code === 'BAD_CREDENTIALS') {
        await consumeOrRefuse(limits.failedByAccount, account, 'failed sign-ins on this account', res);
      }
      throw err;
    }
    await limits.failedByAccount.delete(account);
    res.json({ user: await startSignedIn(req, res, user) });
  });

  // A new shop and its owner; the same answer whether or not the address has an account.
  router.post('/auth/sign-up', limitByAddress(limits, 'sign-ups from your address'), async (req, res) => {
    const body = signUpBodySchema.parse(req.body);
    await consumeOrRefuse(limits.mailsByRecipient, body.email, 'messages to that address', res);
    await signUp(body, config.appUrl, mailer);
    res.status(202).json({ sent: true });
  });

  router.post('/auth/verify', limitByAddress(limits, 'requests from your address'), async (req, res) => {
    await verifyEmail(verifyBodySchema.parse(req.body).token);
    res.status(204).end();
  });

  // The same answer whether or not an unconfirmed account has that address.
  router.post('/auth/verify/resend', limitByAddress(limits, 'requests from your address'), async (req, res) => {
    const { email } = resendVerificationBodySchema.parse(req.body);
    await consumeOrRefuse(limits.mailsByRecipient, email, 'messages to that address', res);
    await resendVerification(email, config.appUrl, mailer);
    res.status(204).end();
  });

  router.post('/auth/invitation', limitByAddress(limits, 'requests from your address'), async (req, res) => {
    res.json(await previewInvitation(invitationTokenBodySchema.parse(req.body).token));
  });

  // Sets the invited person's password and signs them in.
  router.post('/auth/invitation/accept', limitByAddress(limits, 'requests from your address'), async (req, res) => {
    const { token, password } = acceptInvitationBodySchema.parse(req.body);
    const user = await acceptInvitation(token, password);
    res.status(201).json({ user: await startSignedIn(req, res, user) });
  });

  // Signing out ends this session on the server (a copy of the token stops working) and clears
  // this browser's cookie; it needs no valid session.
  router.post('/auth/sign-out', async (req, res) => {
    const claims = readSessionToken(config, tokenOf(req));
    if (claims) await endSession(claims.sid);
    res.clearCookie(SESSION_COOKIE, cookie(req));
    // Analysis answers may be kept by the browser for revalidation (private, no-cache): dropped
    // here, so the next person on this device finds none of them (W3C Clear Site Data).
    res.set('Clear-Site-Data', '"cache"');
    res.status(204).end();
  });

  // The same answer whether or not the account exists; limited per address and per account.
  router.post('/auth/forgot', limitByAddress(limits, 'requests from your address'), async (req, res) => {
    const { email } = forgotBodySchema.parse(req.body);
    await consumeOrRefuse(limits.resetsByAccount, email, 'reset e-mails for this account', res);
    // The link goes to the configured address only, never to the Host the request names.
    await requestPasswordReset(email, config.appUrl, mailer);
    res.status(204).end();
  });

  router.post('/auth/reset', limitByAddress(limits, 'requests from your address'), async (req, res) => {
    const { token, password } = resetBodySchema.parse(req.body);
    await resetPassword(token, password);
    res.status(204).end();
  });

  router.post('/auth/sign-out-everywhere', authenticate(config), async (req, res) => {
    await signOutEverywhere(actorOf(res));
    res.clearCookie(SESSION_COOKIE, cookie(req));
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
    await updateUnits(actorOf(res), body);
    res.json(await describeMe(actorOf(res)));
  });

  return router;
}
