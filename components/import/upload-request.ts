/**
 * A multipart upload of one bay file to the API, with upload progress. XMLHttpRequest rather than
 * fetch: fetch reports no upload progress in browsers. Same origin, the session cookie, and the
 * CSRF header the server requires; the browser sets the multipart Content-Type itself.
 */
import { ApiError, apiErrorOf } from '../api-client';

/** A file to upload: the browser's File (what expo-document-picker gives on the web). */
export type UploadFile = Blob & { name: string };

/** Upload progress: 0..1 of the bytes sent, or null when the browser cannot tell. */
export type UploadProgress = (fraction: number | null) => void;

/**
 * POSTs `file` (field "file") and `options` (field "options", JSON text) to /api + path.
 * @returns the parsed JSON answer
 * @throws ApiError for any answer other than 2xx, and (status 0, code NETWORK) when offline
 */
export function uploadBayFile<T>(path: string, file: UploadFile, options: unknown, onProgress?: UploadProgress, signal?: AbortSignal): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('x-ovalyard-request', '1');
    if (onProgress) {
      xhr.upload.onprogress = (e) => onProgress(e.lengthComputable && e.total > 0 ? e.loaded / e.total : null);
      xhr.upload.onload = () => onProgress(1);
    }
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          resolve(JSON.parse(xhr.responseText) as T);
        } catch {
          reject(new ApiError(xhr.status, 'BAD_ANSWER', 'The server sent an answer Ovalyard cannot read. Try again.'));
        }
      } else reject(apiErrorOf(xhr.status, xhr.responseText));
    };
    xhr.onerror = () => reject(new ApiError(0, 'NETWORK', 'Ovalyard cannot reach the server. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiError(0, 'ABORTED', 'The upload was stopped.'));
    signal?.addEventListener('abort', () => xhr.abort());
    const form = new FormData();
    // options first: the server reads the text field before the file
    form.append('options', JSON.stringify(options));
    form.append('file', file, file.name);
    xhr.send(form);
  });
}
