import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { can, type Role } from '../../../shared/permissions';
import type { Photo, PhotoPatch } from '../../../shared/schemas/photos';
import { photoUploadFieldsSchema } from '../../../shared/schemas/photos';
import type { AppDeps } from '../../app-deps';
import { BadRequestError, NotFoundError } from '../../http/errors';
import type { RestorationAndRole } from '../../http/guard';
import { recordEvent } from '../events/record-event';
import { deletePhotoObjects, photoKeys } from './photo-objects';
import { processPhoto } from './photo-pipeline';
import type { PageWindow } from '../../db/keyset';
import { photosRepo, type PhotoRow } from './photos.repo';

const extension: Record<string, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'image/heif': 'heic',
  'image/avif': 'avif',
};

export type PhotosDeps = Pick<AppDeps, 'db' | 'storage'> & { config: Pick<AppDeps['config'], 'uploads'> };

export function photosService({ db, storage, config }: PhotosDeps) {
  const repo = photosRepo(db);

  async function toPhoto(row: PhotoRow, role: Role): Promise<Photo> {
    const keys = photoKeys(row.storageKey);
    const [thumb, phone, display, original] = await Promise.all([
      storage.getSignedUrl(keys.thumb),
      storage.getSignedUrl(keys.phone),
      storage.getSignedUrl(keys.display),
      can(role, 'photos.original')
        ? storage.getSignedUrl(keys.original, {
            downloadName: `photo-${row.id}.${extension[row.contentType] ?? 'img'}`,
          })
        : undefined,
    ]);
    return {
      id: row.id,
      restorationId: row.restorationId,
      view: row.view,
      phase: row.phase,
      caption: row.caption,
      ownerVisible: row.ownerVisible,
      width: row.width,
      height: row.height,
      takenAt: row.takenAt?.toISOString() ?? null,
      uploadedAt: row.createdAt.toISOString(),
      uploadedBy: row.uploadedBy,
      contentType: row.contentType,
      sizeBytes: row.sizeBytes,
      urls: original ? { thumb, phone, display, original } : { thumb, phone, display },
      ...(row.findingCounts ? { findingCounts: row.findingCounts } : {}),
    };
  }

  /** A photo the caller may see: 404 when they may not (an owner is never told that an unshared photo exists). */
  async function visible(id: number, role: Role): Promise<PhotoRow> {
    const row = await repo.find(id);
    if (!row || !can(role, 'photos.view', { ownerVisible: row.ownerVisible })) throw new NotFoundError();
    return row;
  }

  return {
    /** One page of the photos this role may see (`limit + 1` rows read, for the page helper to cut). */
    page(restorationId: number, role: Role, window: PageWindow): Promise<PhotoRow[]> {
      return repo.list(restorationId, role, window);
    },
    present(rows: PhotoRow[], role: Role): Promise<Photo[]> {
      return Promise.all(rows.map((r) => toPhoto(r, role)));
    },
    async get(id: number, role: Role) {
      return toPhoto(await visible(id, role), role);
    },
    /**
     * Checks and stores one uploaded file. Objects go up first, the row last; on any failure the
     * objects already stored are deleted, so a failed upload leaves neither.
     */
    async ingest(
      restorationId: number,
      file: { path: string; size: number },
      rawFields: Record<string, unknown>,
      uploadedById: number | null,
      signal?: AbortSignal,
    ) {
      const fields = photoUploadFieldsSchema.safeParse(rawFields);
      if (!fields.success)
        throw new BadRequestError(fields.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; '));
      const processed = await processPhoto(file.path, { maxPixels: config.uploads.maxPixels });
      const storageKey = `${restorationId}/${randomUUID()}`;
      const keys = photoKeys(storageKey);
      try {
        // A client that gave up (closed the connection) gets nothing stored: the signal aborts the puts.
        signal?.throwIfAborted();
        // A stream cannot be replayed by the SDK's own retries: a failed attempt opens the file again (three in all, as for buffers).
        for (let attempt = 1; ; attempt++) {
          try {
            await storage.putObject(keys.original, createReadStream(file.path), processed.contentType, file.size, {
              signal,
            });
            break;
          } catch (err) {
            if (attempt >= 3 || signal?.aborted) throw err;
          }
        }
        await storage.putObject(keys.display, processed.display, 'image/webp', undefined, { signal });
        await storage.putObject(keys.phone, processed.phone, 'image/webp', undefined, { signal });
        await storage.putObject(keys.thumb, processed.thumb, 'image/webp', undefined, { signal });
        signal?.throwIfAborted();
        // The row and its history line together: if either fails, neither stays and the objects go below.
        return await db.transaction(async (tx) => {
          const id = await photosRepo(tx).insert({
            restorationId,
            storageKey,
            ...fields.data,
            width: processed.width,
            height: processed.height,
            takenAt: processed.takenAt,
            contentType: processed.contentType,
            sizeBytes: file.size,
            uploadedById,
          });
          await recordEvent(tx, {
            restorationId,
            kind: 'photo-added',
            actorId: uploadedById,
            photoId: id,
            data: { view: fields.data.view, phase: fields.data.phase },
          });
          return id;
        });
      } catch (err) {
        await deletePhotoObjects(storage, storageKey).catch(() => {});
        if (signal?.aborted) throw new BadRequestError('The upload was cancelled before it was stored.');
        throw err;
      }
    },
    async update(id: number, patch: PhotoPatch, role: Role) {
      await visible(id, role);
      await repo.update(id, patch);
      return toPhoto((await repo.find(id))!, role);
    },
    /** Deletes the row, then its objects; an object left by a failure here is caught by the sweep. */
    async remove(id: number, role: Role) {
      await visible(id, role);
      const storageKey = await repo.remove(id);
      if (storageKey) await deletePhotoObjects(storage, storageKey).catch(() => {});
    },
    restorationOf: (id: number) => repo.restorationOf(id),
    /** The photo as the guard's subject: who may not see it gets a 404, then the route's rule decides. */
    async subjectOf(id: number): Promise<RestorationAndRole | undefined> {
      const row = await repo.find(id);
      return (
        row && {
          restorationId: row.restorationId,
          subject: { view: 'photos.view', context: { ownerVisible: row.ownerVisible } },
        }
      );
    },
  };
}
