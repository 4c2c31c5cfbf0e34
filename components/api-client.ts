import { errorBodySchema } from '@/server/schemas';

/** An error answer of the API (or a network failure, status 0). Branch on `code`, show `message`. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown[] | undefined;

  constructor(status: number, code: string, message: string, details?: unknown[]) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

/** Query-string values; undefined and empty strings are left out. */
export type QueryParams = Record<string, string | undefined>;

function withQuery(path: string, query?: QueryParams): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(key, value);
  }
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
}

/**
 * Calls the API on the same origin with the session cookie. State-changing requests carry the
 * CSRF header the server requires. Resolves to the parsed JSON (undefined for 204).
 * @throws ApiError for any answer other than 2xx, and (status 0, code NETWORK) when offline
 */
export async function apiRequest<T>(method: Method, path: string, options: { body?: unknown; query?: QueryParams } = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (method !== 'GET') headers['x-ovalyard-request'] = '1';
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  let res: Response;
  try {
    res = await fetch(`/api${withQuery(path, options.query)}`, {
      method,
      headers,
      credentials: 'include',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
    });
  } catch {
    throw new ApiError(0, 'NETWORK', 'Ovalyard cannot reach the server. Check the connection and try again.');
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  if (!res.ok) throw apiErrorOf(res.status, text);
  try {
    return (text ? JSON.parse(text) : undefined) as T;
  } catch {
    throw new ApiError(res.status, 'BAD_ANSWER', 'The server sent an answer Ovalyard cannot read. Try again.');
  }
}

/** The ApiError of a non-2xx answer's text: the API's error body, or a general one. */
export function apiErrorOf(status: number, text: string): ApiError {
  let json: unknown;
  try {
    json = text ? JSON.parse(text) : undefined;
  } catch {
    json = undefined;
  }
  const parsed = errorBodySchema.safeParse(json);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiError(status, code, message, details);
  }
  return new ApiError(status, 'HTTP_' + status, `The server answered ${status}. Try again in a moment.`);
}

export const api = {
  get: <T>(path: string, query?: QueryParams) => apiRequest<T>('GET', path, { query }),
  post: <T>(path: string, body?: unknown) => apiRequest<T>('POST', path, { body }),
  patch: <T>(path: string, body: unknown) => apiRequest<T>('PATCH', path, { body }),
  put: <T>(path: string, body: unknown) => apiRequest<T>('PUT', path, { body }),
  delete: <T>(path: string) => apiRequest<T>('DELETE', path),
};

/** The message to show for any thrown value. */
export function errorMessage(error: unknown): string {
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong. Try again.';
}

/** Answers whose details name the fields at fault: a body that fails its schema, a password too easy to guess. */
const FIELD_ERROR_CODES = new Set(['VALIDATION_FAILED', 'WEAK_PASSWORD']);

/** Field errors from a VALIDATION_FAILED or WEAK_PASSWORD answer's details ({ path, message }[]), by first path key. */
export function fieldErrorsFromApi(error: unknown): Record<string, string> {
  const out: Record<string, string> = {};
  if (!(error instanceof ApiError) || !FIELD_ERROR_CODES.has(error.code) || !error.details) return out;
  for (const d of error.details) {
    if (d && typeof d === 'object' && 'path' in d && 'message' in d) {
      const key = Array.isArray(d.path) && d.path.length > 0 ? String(d.path[0]) : '';
      if (key && !out[key]) out[key] = String(d.message);
    }
  }
  return out;
}
