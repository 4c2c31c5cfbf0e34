import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ConnectionError, UniqueConstraintError, ForeignKeyConstraintError } from 'sequelize';
import { isRetryable } from '../services/retry';
import { ZodError } from 'zod';
import { HttpError } from '../errors';

type Logger = (message: string, error: unknown) => void;

/** The only place errors become answers: one JSON format for all. */
export function errorHandler(log: Logger = (m, e) => console.error(m, e)): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) return;
    let status = 500;
    let code = 'INTERNAL';
    let message = 'Something went wrong on our side. Try again; if it persists, tell us.';
    let details: unknown[] | undefined;
    if (err instanceof HttpError) {
      ({ status, code, message } = err);
      details = err.details;
    } else if (err instanceof ZodError) {
      status = 400;
      code = 'VALIDATION_FAILED';
      message = err.issues[0]?.message ?? 'The request is not valid.';
      details = err.issues.map((i) => ({ path: i.path, message: i.message }));
    } else if (err instanceof UniqueConstraintError) {
      status = 409;
      code = 'CONFLICT';
      message = 'That record already exists.';
    } else if (err instanceof ForeignKeyConstraintError) {
      status = 409;
      code = 'CONFLICT';
      message = 'That record is linked to another that does not exist or is still in use.';
    } else if (err instanceof ConnectionError || isConnectionLoss(err) || isRetryable(err)) {
      // the database is restarting or out of reach, or stayed deadlocked after retries: try again
      status = 503;
      code = 'UNAVAILABLE';
      message = 'The database is not answering just now. Nothing was changed; try again in a moment.';
      log(`${req.method} ${req.originalUrl} failed (database)`, err);
    } else if (err?.type === 'entity.too.large' || err?.status === 413) {
      status = 413;
      code = 'TOO_LARGE';
      message = 'The request is too large.';
    } else if (err?.type === 'entity.parse.failed') {
      status = 400;
      code = 'BAD_JSON';
      message = 'The request body is not valid JSON.';
    } else {
      log(`${req.method} ${req.originalUrl} failed`, err);
    }
    res.status(status).json({ error: { code, message, ...(details ? { details } : {}) } });
  };
}

/** A connection to MariaDB lost or refused, as the mariadb driver reports it. */
function isConnectionLoss(err: unknown): boolean {
  const e = (err as { parent?: unknown; original?: unknown } | null)?.parent ?? (err as { original?: unknown } | null)?.original ?? err;
  const x = e as { fatal?: boolean; code?: string; sqlState?: string } | null;
  if (!x) return false;
  return x.fatal === true || x.code === 'ECONNREFUSED' || x.code === 'ER_SOCKET_UNEXPECTED_CLOSE' || x.code === 'ER_CONNECTION_TIMEOUT' || x.code === 'ER_GET_CONNECTION_TIMEOUT' || x.sqlState === '08S01';
}

/** 404 in the same format for unknown /api routes. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'NOT_FOUND', `No such API route: ${req.method} ${req.path}`));
};
