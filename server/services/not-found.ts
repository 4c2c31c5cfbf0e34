import { HttpError, notFound } from '../errors';

/**
 * Awaits a lookup and answers its 404 in the caller's words ("That bay file was not found.").
 * Only a 404 is renamed: any other failure (a database that does not answer…) goes on as it is,
 * so it never looks like "not found".
 */
export async function renameNotFound<T>(lookup: Promise<T>, what: string): Promise<T> {
  try {
    return await lookup;
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) throw notFound(what);
    throw err;
  }
}

/** Awaits a lookup and turns only its 404 into the given error (a 400 on a body field, say). */
export async function notFoundAs<T>(lookup: Promise<T>, error: () => Error): Promise<T> {
  try {
    return await lookup;
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) throw error();
    throw err;
  }
}
