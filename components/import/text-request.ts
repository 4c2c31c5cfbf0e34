/**
 * A stored bay file's text from the API, and that text as a file the preview upload takes. The
 * JSON client (api-client.ts) parses answers as JSON; the raw file is text/csv.
 */
import { ApiError } from '../api-client';
import { apiErrorOf } from '../api-client';
import type { UploadFile } from './upload-request';

/**
 * GETs /api + path as text, with the session cookie.
 * @throws ApiError for any answer other than 2xx, and (status 0, code NETWORK) when offline
 */
export async function downloadText(path: string, signal?: AbortSignal): Promise<string> {
  let res: Response;
  try {
    res = await fetch(`/api${path}`, { headers: { Accept: 'text/csv, application/json' }, credentials: 'include', signal });
  } catch (err) {
    if (signal?.aborted) throw err;
    throw new ApiError(0, 'NETWORK', 'Ovalyard cannot reach the server. Check the connection and try again.');
  }
  const text = await res.text();
  if (!res.ok) throw apiErrorOf(res.status, text);
  return text;
}

/** The stored text under its file name, to send to the same preview as a picked file. */
export function storedUploadFile(text: string, fileName: string): UploadFile {
  return new File([text], fileName, { type: 'text/csv' });
}
