import { can, type Role } from '../../../shared/permissions';
import {
  sheetUploadFieldsSchema,
  type Sheet,
  type SheetPage,
  type SheetPagePatch,
} from '../../../shared/schemas/sheets';
import type { PhotosDeps } from '../photos/photos.service';
import { unitOfWork } from '../../db/unit-of-work';
import { BadRequestError, NotFoundError } from '../../http/errors';
import type { RestorationAndRole } from '../../http/guard';
import { recordEvent } from '../events/record-event';
import { deleteSheetObjects, sheetKeys } from './sheet-objects';
import { storeSheetFile, type StoredSheet } from './sheet-ingest';
import { sheetsRepo, type SheetPageRow } from './sheets.repo';

const extension: Record<string, string> = {
  'application/pdf': 'pdf',
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/tiff': 'tif',
  'image/webp': 'webp',
  'image/heif': 'heic',
  'image/avif': 'avif',
};

export function sheetsService({ db, storage, config }: PhotosDeps) {
  const repo = sheetsRepo(db);

  async function toPage(row: SheetPageRow, role: Role): Promise<SheetPage> {
    const keys = sheetKeys(row.storageKey);
    const page = keys.page(row.pageNumber);
    const [thumb, display, large, original] = await Promise.all([
      storage.getSignedUrl(page.thumb),
      storage.getSignedUrl(page.display),
      storage.getSignedUrl(page.large),
      can(role, 'sheets.upload')
        ? storage.getSignedUrl(keys.original, {
            downloadName: `sheet-${row.sheetId}.${extension[row.contentType] ?? 'bin'}`,
          })
        : undefined,
    ]);
    return {
      id: row.id,
      restorationId: row.restorationId,
      sheetId: row.sheetId,
      pageNumber: row.pageNumber,
      kind: row.kind,
      title: row.title,
      ownerVisible: row.ownerVisible,
      width: row.width,
      height: row.height,
      uploadedAt: row.createdAt.toISOString(),
      urls: original ? { thumb, display, large, original } : { thumb, display, large },
    };
  }

  /** A page the caller may see (else 404). */
  async function visible(id: number, role: Role): Promise<SheetPageRow> {
    const row = await repo.findPage(id);
    if (!row || !can(role, 'sheets.view', { ownerVisible: row.ownerVisible })) throw new NotFoundError();
    return row;
  }

  return {
    async list(restorationId: number, role: Role): Promise<SheetPage[]> {
      return Promise.all((await repo.listPages(restorationId, role)).map((r) => toPage(r, role)));
    },
    async get(id: number, role: Role) {
      return toPage(await visible(id, role), role);
    },
    /**
     * Stores an uploaded sheet (a PDF drawn page by page, or one scan): objects go up first, then the sheet,
     * its pages and the history line in one transaction; on any failure the objects stored are deleted.
     */
    async ingest(
      restorationId: number,
      file: { path: string; size: number; mimeType: string },
      rawFields: Record<string, unknown>,
      uploadedById: number,
      role: Role,
      signal?: AbortSignal,
    ): Promise<Sheet> {
      const fields = sheetUploadFieldsSchema.safeParse(rawFields);
      if (!fields.success)
        throw new BadRequestError(fields.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; '));
      let stored: StoredSheet | undefined;
      try {
        stored = await storeSheetFile(storage, file, { restorationId, maxPixels: config.uploads.maxPixels, signal });
        signal?.throwIfAborted();
        const { storageKey, contentType, pages } = stored;
        const sheetId = await unitOfWork(db, async (tx) => {
          const id = await sheetsRepo(tx).insertSheet({
            restorationId,
            storageKey,
            contentType,
            sizeBytes: file.size,
            uploadedById,
          });
          const pageIds: number[] = [];
          for (const p of pages)
            pageIds.push(await sheetsRepo(tx).insertPage({ sheetId: id, restorationId, ...fields.data, ...p }));
          await recordEvent(tx, {
            restorationId,
            kind: 'sheet-added',
            actorId: uploadedById,
            sheetPageId: pageIds[0],
            data: { pages: pages.length, contentType },
          });
          return id;
        });
        const rows = await Promise.all((await repo.pagesOf(sheetId)).map((r) => toPage(r, role)));
        return { id: sheetId, restorationId, contentType, pages: rows };
      } catch (err) {
        if (stored) await deleteSheetObjects(storage, stored.storageKey).catch(() => {});
        if (signal?.aborted) throw new BadRequestError('The upload was cancelled before it was stored.');
        throw err;
      }
    },
    async update(id: number, patch: SheetPagePatch, role: Role) {
      await visible(id, role);
      await repo.updatePage(id, patch);
      return toPage((await repo.findPage(id))!, role);
    },
    /** Deletes the page (and the sheet with its objects when it was the last page). */
    async remove(id: number, role: Role) {
      await visible(id, role);
      await unitOfWork(db, async (tx, afterCommit) => {
        const gone = await sheetsRepo(tx).removePage(id);
        if (gone)
          afterCommit(() =>
            deleteSheetObjects(storage, gone.storageKey, gone.sheetGone ? undefined : gone.pageNumber).catch(() => {}),
          );
      });
    },
    restorationOfPage: (id: number) => repo.restorationOfPage(id),
    /** The page as the guard's subject: who may not see it gets a 404, then the route's rule decides. */
    async subjectOfPage(id: number): Promise<RestorationAndRole | undefined> {
      const row = await repo.findPage(id);
      return (
        row && {
          restorationId: row.restorationId,
          subject: { view: 'sheets.view', context: { ownerVisible: row.ownerVisible } },
        }
      );
    },
  };
}
