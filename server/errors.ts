/** An error with an HTTP status and a stable code the client branches on. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown[],
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const notFound = (what = 'That record') => new HttpError(404, 'NOT_FOUND', `${what} was not found.`);
export const forbidden = (message = 'Your role may not do that.') => new HttpError(403, 'FORBIDDEN', message);
export const unauthenticated = (message = 'Sign in first.') => new HttpError(401, 'UNAUTHENTICATED', message);
