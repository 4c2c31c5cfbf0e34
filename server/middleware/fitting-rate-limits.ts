/**
 * Rate limits of remote fittings, in the same `rate_limits` table as the sign-in limits (so
 * several API processes share them): messages posted per person, fitting requests per person.
 */
import { RateLimiterMySQL, type RateLimiterAbstract } from 'rate-limiter-flexible';
import type { Sequelize } from 'sequelize';
import { limiterStore } from './rate-limit';

export interface FittingLimits {
  /** Messages per person: 30 in ten minutes. */
  messages: RateLimiterAbstract;
  /** Remote fitting requests per person: 5 a day. */
  requests: RateLimiterAbstract;
}

export function createFittingLimits(sequelize: Sequelize, points = { messages: 30, requests: 5 }): FittingLimits {
  const common = limiterStore(sequelize);
  return {
    messages: new RateLimiterMySQL({ ...common, keyPrefix: 'msg', points: points.messages, duration: 600 }),
    requests: new RateLimiterMySQL({ ...common, keyPrefix: 'req', points: points.requests, duration: 86_400 }),
  };
}
