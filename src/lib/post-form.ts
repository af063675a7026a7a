import { apiErrorSchema } from '../../shared/schemas/errors';
import { ApiError } from './api-client';

export interface FormProgress {
  /** Bytes of the request body sent so far. */
  loaded: number;
  /** Bytes of the whole request body. */
  total: number;
}

function parseBody(text: string): unknown {
  try {
    return text ? JSON.parse(text) : undefined;
  } catch {
    return undefined;
  }
}

/**
 * POSTs multipart/form-data to the API with XMLHttpRequest, which (unlike fetch) reports upload progress.
 * Rejects with ApiError carrying the server's message; a cancel rejects with code 'aborted'.
 */
export function postForm<T>(
  path: string,
  form: FormData,
  {
    onProgress,
    signal,
    fallback = {},
  }: { onProgress?: (p: FormProgress) => void; signal?: AbortSignal; fallback?: Record<number, string> } = {},
): Promise<T> {
  return new Promise((resolve, reject) => {
    const aborted = () => new ApiError(0, 'aborted', 'Upload cancelled.');
    if (signal?.aborted) return reject(aborted());
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress?.({ loaded: e.loaded, total: e.total });
    xhr.onload = () => {
      const body = parseBody(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) return resolve(body as T);
      const parsed = apiErrorSchema.safeParse(body);
      if (parsed.success) {
        const { code, message, details } = parsed.data.error;
        return reject(new ApiError(xhr.status, code, message, details));
      }
      reject(new ApiError(xhr.status, 'unknown', fallback[xhr.status] ?? `The server answered ${xhr.status}.`));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(
          0,
          'network',
          'The upload was cut off. Check the connection and retry; a very large file may be refused.',
        ),
      );
    xhr.onabort = () => reject(aborted());
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}
