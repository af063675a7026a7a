import type { z } from 'zod';
import { photoSchema, type Photo, type photoUploadFieldsSchema } from '../../../../shared/schemas/photos';
import { postForm, type FormProgress } from '../../../lib/post-form';

/** The batch fields after the form has checked them. */
export type UploadFields = z.output<typeof photoUploadFieldsSchema>;

/** Bytes sent so far of the whole request body (a little more than the file: the form's boundaries and fields). */
export type UploadProgress = FormProgress;

const fallbackMessages: Record<number, string> = {
  400: 'The server could not read that file as a photo.',
  401: 'Your session has ended. Sign in again, then retry.',
  403: 'You are not allowed to add photos to this restoration.',
  404: 'This restoration was not found.',
  413: 'That photo is larger than Gridleak accepts.',
  415: 'That file type is not accepted. Use JPEG, PNG, WebP, HEIC or AVIF.',
  0: 'The upload was cut off. Check the connection and retry; a very large photo may be refused.',
};

/**
 * POST one image as multipart/form-data (with upload progress, see postForm); answers the stored photo. A server that
 * refuses a large body early often drops the connection, which looks like a network error.
 */
export function uploadPhoto(
  restorationId: number,
  file: File,
  fields: UploadFields,
  { onProgress, signal }: { onProgress?: (progress: UploadProgress) => void; signal?: AbortSignal } = {},
): Promise<Photo> {
  const form = new FormData();
  // Text fields before the file: a streaming parser then knows them when the image arrives.
  form.append('view', fields.view);
  form.append('phase', fields.phase);
  form.append('caption', fields.caption);
  form.append('ownerVisible', String(fields.ownerVisible));
  form.append('file', file, file.name);
  return postForm(`/restorations/${restorationId}/photos`, form, {
    schema: photoSchema,
    onProgress,
    size: file.size,
    signal,
    fallback: fallbackMessages,
  });
}
