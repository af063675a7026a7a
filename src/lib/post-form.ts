import type { z } from 'zod';
import { apiErrorSchema } from '../../shared/schemas/errors';
import { ApiError, checkAnswer } from './api-client';

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

interface FormOptions<S extends z.ZodType> {
  /** The shared schema of the answer: its type is returned, and development and tests check it (as `api` does). */
  schema: S;
  onProgress?: (p: FormProgress) => void;
  /** The size to report as `total` when the browser cannot measure the body; without it such progress is not reported. */
  size?: number;
  signal?: AbortSignal;
  /** Words for an error answer that carries none, by status (0: the connection was cut). */
  fallback?: Record<number, string>;
}

/**
 * POSTs multipart/form-data to the API with XMLHttpRequest, which (unlike fetch) reports upload progress.
 * Rejects with ApiError carrying the server's message; a cancel rejects with code 'aborted'.
 */
export function postForm<S extends z.ZodType>(
  path: string,
  form: FormData,
  { schema, onProgress, size, signal, fallback = {} }: FormOptions<S>,
): Promise<z.output<S>> {
  return new Promise((resolve, reject) => {
    const aborted = () => new ApiError(0, 'aborted', 'Upload cancelled.');
    if (signal?.aborted) return reject(aborted());
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      const total = e.lengthComputable ? e.total : size;
      if (total !== undefined) onProgress?.({ loaded: e.loaded, total });
    };
    xhr.onload = () => {
      const body = parseBody(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          return resolve(checkAnswer(path, body, schema));
        } catch (mismatch) {
          return reject(mismatch as Error);
        }
      }
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
          fallback[0] ?? 'The upload was cut off. Check the connection and retry; a very large file may be refused.',
        ),
      );
    xhr.onabort = () => reject(aborted());
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}
