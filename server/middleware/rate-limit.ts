/**
 * Rate limits kept in MariaDB (rate-limiter-flexible's MySQL store, table `rate_limits`), so
 * several API processes on one database share them: sign-in attempts per client address, failed
 * sign-ins per account, reset e-mails per address and per account.
 *
 * The client address is the TCP peer unless TRUST_PROXY is set; then it is the address the proxy
 * in front of us writes into X-Forwarded-For. Set TRUST_PROXY only when every request reaches the
 * server through that proxy: a client that can reach the server directly could otherwise write
 * any address into that header and have a fresh limit for each one.
 */
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { RateLimiterMySQL, RateLimiterRes, type RateLimiterAbstract } from 'rate-limiter-flexible';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { HttpError } from '../errors';

type Callback = (err: Error | null, result?: unknown) => void;
interface DriverConnection {
  query(sql: string, values?: unknown[]): Promise<unknown>;
  rollback(): Promise<void>;
}

/**
 * The store reaches MariaDB through Sequelize's own pool, with the callback API and `??`
 * identifier placeholders it expects (the mariadb driver has promises and `?` only).
 */
function storePool(sequelize: Sequelize) {
  const manager = (sequelize as unknown as { connectionManager: { getConnection(): Promise<DriverConnection>; releaseConnection(c: DriverConnection): Promise<void> } }).connectionManager;
  const expand = (sql: string, values: unknown[]): [string, unknown[]] => {
    const out: unknown[] = [];
    let k = 0;
    const text = sql.replace(/\?\??/g, (mark) => {
      const value = values[k++];
      if (mark === '?') {
        out.push(value);
        return '?';
      }
      return `\`${String(value).replace(/`/g, '``')}\``;
    });
    return [text, out];
  };
  const plain = (result: unknown) =>
    Array.isArray(result)
      ? result.map((row: Record<string, unknown>) => Object.fromEntries(Object.entries(row).map(([k, v]) => [k, typeof v === 'bigint' ? Number(v) : v])))
      : result;
  const wrap = (conn: DriverConnection) => ({
    query(sql: string, values: unknown[] | Callback, cb?: Callback) {
      const done = (typeof values === 'function' ? values : cb) as Callback;
      const [text, args] = expand(sql, Array.isArray(values) ? values : []);
      conn.query(text, args).then((r) => done(null, plain(r)), (err: Error) => done(err));
    },
    rollback() {
      conn.rollback().catch(() => {});
    },
    release() {
      void manager.releaseConnection(conn);
    },
  });
  return {
    getConnection(cb: Callback) {
      manager.getConnection().then((conn) => cb(null, wrap(conn)), (err: Error) => cb(err));
    },
  };
}

export interface RateLimits {
  /** Sign-in, reset and forgot requests per client address. */
  byAddress: RateLimiterAbstract;
  /** Failed sign-ins per account (e-mail). */
  failedByAccount: RateLimiterAbstract;
  /** Reset e-mails asked per account. */
  resetsByAccount: RateLimiterAbstract;
  /** Sign-up, confirmation and invitation e-mails per recipient address. */
  mailsByRecipient: RateLimiterAbstract;
  /** Invitation e-mails (new and sent again) per shop. */
  invitationsByShop: RateLimiterAbstract;
}

/** The limiters of one app, on its database (the `rate_limits` table of migration 0006). */
/** Options every limiter of this database shares: the `rate_limits` table through Sequelize's pool. */
export function limiterStore(sequelize: Sequelize) {
  return {
    storeClient: storePool(sequelize),
    storeType: 'pool',
    dbName: sequelize.getDatabaseName(),
    tableName: 'rate_limits',
    tableCreated: true,
    clearExpiredByTimeout: false,
  };
}

export function createRateLimits(sequelize: Sequelize, config: Config): RateLimits {
  const duration = Math.max(1, Math.round(config.signIn.windowMs / 1000));
  const common = { ...limiterStore(sequelize), duration };
  return {
    byAddress: new RateLimiterMySQL({ ...common, keyPrefix: 'addr', points: config.signIn.limit }),
    failedByAccount: new RateLimiterMySQL({ ...common, keyPrefix: 'acct', points: config.signIn.accountLimit }),
    resetsByAccount: new RateLimiterMySQL({ ...common, keyPrefix: 'reset', points: Math.max(3, Math.ceil(config.signIn.accountLimit / 2)) }),
    mailsByRecipient: new RateLimiterMySQL({ ...common, keyPrefix: 'mailto', points: Math.max(3, Math.ceil(config.signIn.accountLimit / 2)) }),
    invitationsByShop: new RateLimiterMySQL({ ...common, keyPrefix: 'invite', points: Math.max(30, config.signIn.limit * 3) }),
  };
}

function tooMany(res: RateLimiterRes, what: string): HttpError {
  const minutes = Math.max(1, Math.ceil(res.msBeforeNext / 60_000));
  return new HttpError(429, 'TOO_MANY_ATTEMPTS', `Too many ${what}. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`);
}

/**
 * Consumes one point of a limiter for a key; throws 429 TOO_MANY_ATTEMPTS (with Retry-After on
 * the response) when none is left. A database failure is thrown as it is (the error handler
 * answers 503).
 */
export async function consumeOrRefuse(limiter: RateLimiterAbstract, key: string, what: string, res?: Response): Promise<void> {
  try {
    await limiter.consume(key);
  } catch (err) {
    if (err instanceof RateLimiterRes) {
      res?.set('Retry-After', String(Math.ceil(err.msBeforeNext / 1000)));
      throw tooMany(err, what);
    }
    throw err;
  }
}

/** Refuses with 429 when a key has no points left, without consuming one. */
export async function refuseWhenSpent(limiter: RateLimiterAbstract, key: string, what: string, res?: Response): Promise<void> {
  const state = await limiter.get(key);
  if (state && state.remainingPoints <= 0 && state.msBeforeNext > 0) {
    res?.set('Retry-After', String(Math.ceil(state.msBeforeNext / 1000)));
    throw tooMany(state, what);
  }
}

/** Middleware: one point per request from a client address. */
export function limitByAddress(limits: RateLimits, what = 'attempts from your address'): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    await consumeOrRefuse(limits.byAddress, req.ip ?? 'unknown', what, res);
    next();
  };
}
