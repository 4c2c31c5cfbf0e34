import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { Config } from '../config';
import { unauthenticated } from '../errors';

export const SESSION_COOKIE = 'ovy_session';

export interface TokenClaims {
  sub: string;
  ver: number;
}

/**
 * The secret as a key object, made once per configuration: given a string, jsonwebtoken first
 * tries to read it as a public key and catches the failure on every call, which cost about a
 * seventh of the server's time under load (npm run bench, api).
 */
const secretKeys = new WeakMap<Config['jwt'], KeyObject>();
function secretKey(config: Config): KeyObject {
  let key = secretKeys.get(config.jwt);
  if (!key) {
    key = createSecretKey(Buffer.from(config.jwt.secret, 'utf8'));
    secretKeys.set(config.jwt, key);
  }
  return key;
}

/** Signs a session token: HS256, with expiry. */
export function signSessionToken(config: Config, claims: TokenClaims): string {
  return jwt.sign({ ver: claims.ver }, secretKey(config), {
    algorithm: 'HS256',
    expiresIn: config.jwt.ttl as jwt.SignOptions['expiresIn'],
    subject: claims.sub,
    issuer: 'ovalyard',
  });
}

/** Verifies a session token with an explicit algorithm list; throws 401 when it is not valid. */
export function verifySessionToken(config: Config, token: string): TokenClaims {
  try {
    const payload = jwt.verify(token, secretKey(config), { algorithms: ['HS256'], issuer: 'ovalyard' });
    if (typeof payload === 'string' || typeof payload.sub !== 'string') throw new Error('bad payload');
    return { sub: payload.sub, ver: Number(payload.ver ?? 0) };
  } catch {
    throw unauthenticated('Your session has ended. Sign in again.');
  }
}

/** Milliseconds of a TTL like 8h, 30m, 2d. */
export function ttlMs(ttl: string): number {
  const n = Number(ttl.slice(0, -1));
  const unit = ttl.slice(-1);
  return n * ({ s: 1000, m: 60_000, h: 3_600_000, d: 86_400_000 } as Record<string, number>)[unit];
}
