import { rateLimit } from 'express-rate-limit';
import type { Config } from '../config';
import { HttpError } from '../errors';

/** Limits sign-in attempts per client address (express-rate-limit, in-memory store). */
export function signInLimiter(config: Config) {
  return rateLimit({
    windowMs: config.signIn.windowMs,
    limit: config.signIn.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next, options) => {
      const minutes = Math.ceil(options.windowMs / 60_000);
      next(new HttpError(429, 'TOO_MANY_ATTEMPTS', `Too many sign-in attempts. Wait ${minutes} minutes and try again.`));
    },
  });
}
