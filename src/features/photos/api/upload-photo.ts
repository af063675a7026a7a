import type { z } from 'zod';
import { apiErrorSchema } from '../../../../shared/schemas/errors';
import type { Photo, photoUploadFieldsSchema } from '../../../../shared/schemas/photos';
import { ApiError } from '../../../lib/api-client';

/** The batch fields after the form has checked them. */
export type UploadFields = z.output<typeof photoUploadFieldsSchema>;

export interface UploadProgress {
  /** Bytes of the request body sent so far. */
  loaded: number;
  /** Bytes of the whole request body (a little more than the file: the form's boundaries and fields). */
  total: number;
}

const fallbackMessages: Record<number, string> = {
  400: 'The server could not read that file as a photo.',
  401: 'Your session has ended. Sign in again, then retry.',
  403: 'You are not allowed to add photos to this restoration.',
  404: 'This restoration was not found.',
  413: 'That photo is larger than Gridleak accepts.',
  415: 'That file type is not accepted. Use JPEG, PNG, WebP, HEIC or AVIF.',
};

function parseBody(text: string): unknown {
  try {
    return text ? JSON.parse(text) : undefined;
  } catch {
    return undefined;
  }
}

/**
 * POST one image as multipart/form-data. XMLHttpRequest rather than fetch, because only XHR reports upload
 * progress. Rejects with ApiError carrying the server's message; a cancel rejects with code 'aborted'.
 */
export function uploadPhoto(
  restorationId: number,
  file: File,
  fields: UploadFields,
  { onProgress, signal }: { onProgress?: (progress: UploadProgress) => void; signal?: AbortSignal } = {},
): Promise<Photo> {
  return new Promise((resolve, reject) => {
    const aborted = () => new ApiError(0, 'aborted', 'Upload cancelled.');
    if (signal?.aborted) return reject(aborted());

    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/restorations/${restorationId}/photos`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => onProgress?.({ loaded: e.loaded, total: e.lengthComputable ? e.total : file.size });

    xhr.onload = () => {
      const body = parseBody(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) return resolve(body as Photo);
      const parsed = apiErrorSchema.safeParse(body);
      if (parsed.success) {
        const { code, message, details } = parsed.data.error;
        return reject(new ApiError(xhr.status, code, message, details));
      }
      reject(new ApiError(xhr.status, 'unknown', fallbackMessages[xhr.status] ?? `The server answered ${xhr.status}.`));
    };
    // A server that refuses a large body early often drops the connection, which looks like a network error.
    xhr.onerror = () =>
      reject(
        new ApiError(
          0,
          'network',
          'The upload was cut off. Check the connection and retry; a very large photo may be refused.',
        ),
      );
    xhr.onabort = () => reject(aborted());
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });

    const form = new FormData();
    // Text fields before the file: a streaming parser then knows them when the image arrives.
    form.append('view', fields.view);
    form.append('phase', fields.phase);
    form.append('caption', fields.caption);
    form.append('ownerVisible', String(fields.ownerVisible));
    form.append('file', file, file.name);
    xhr.send(form);
  });
}
