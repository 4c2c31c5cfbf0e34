import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { Config } from '../config';
import { unauthenticated } from '../errors';

export const SESSION_COOKIE = 'ovy_session';

export interface TokenClaims {
  sub: string;
  /** The user's token version when signed (raised to end every session at once). */
  ver: number;
  /** The server-side session (sessions table), ended at sign-out. */
  sid: string;
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

/** Signs a session token: HS256, with issue time and expiry. */
export function signSessionToken(config: Config, claims: TokenClaims): string {
  return jwt.sign({ ver: claims.ver, sid: claims.sid }, secretKey(config), {
    algorithm: 'HS256',
    expiresIn: config.jwt.ttl as jwt.SignOptions['expiresIn'],
    subject: claims.sub,
    issuer: 'ovalyard',
  });
}

/**
 * Verifies a session token: explicit algorithm list, issuer, and at most the configured age
 * (JWT_TTL) since it was issued, whatever `exp` it claims — a token without `iat`, or signed
 * with a longer expiry, is refused. Throws 401 when it is not valid.
 */
export function verifySessionToken(config: Config, token: string): TokenClaims {
  try {
    const payload = jwt.verify(token, secretKey(config), { algorithms: ['HS256'], issuer: 'ovalyard', maxAge: config.jwt.ttl });
    if (typeof payload === 'string' || typeof payload.sub !== 'string' || typeof payload.sid !== 'string') throw new Error('bad payload');
    // an expiry further out than the configured session length was not signed by this server's rules
    if (typeof payload.exp !== 'number' || typeof payload.iat !== 'number' || (payload.exp - payload.iat) * 1000 > ttlMs(config.jwt.ttl)) {
      throw new Error('expiry beyond the configured age');
    }
    return { sub: payload.sub, ver: Number(payload.ver ?? 0), sid: payload.sid };
  } catch {
    throw unauthenticated('Your session has ended. Sign in again.');
  }
}

/** The claims of a token if it verifies, else null (sign-out needs no valid session). */
export function readSessionToken(config: Config, token: string | undefined): TokenClaims | null {
  if (!token) return null;
  try {
    return verifySessionToken(config, token);
  } catch {
    return null;
  }
}

/** Milliseconds of a TTL like 8h, 30m, 2d. */
export function ttlMs(ttl: string): number {
  const n = Number(ttl.slice(0, -1));
  const unit = ttl.slice(-1);
  return n * ({ s: 1000, m: 60_000, h: 3_600_000, d: 86_400_000 } as Record<string, number>)[unit];
}
