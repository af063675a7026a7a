import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { can, type Action, type Role } from '../../../shared/permissions';
import { sheetUploadFieldsSchema, type Sheet, type SheetPage, type SheetPagePatch } from '../../../shared/schemas/sheets';
import type { PhotosDeps } from '../photos/photos.service';
import { BadRequestError, ForbiddenError, HttpError, NotFoundError } from '../../http/errors';
import { processPhoto } from '../photos/photo-pipeline';
import { deleteSheetObjects, sheetKeys } from './sheet-objects';
import { sheetsRepo, type SheetPageRow } from './sheets.repo';

/**
 * The large variant's long side. A 300-dpi A3 scan (4,960 px) is kept whole, so 6-point print (about 25 px
 * tall at 300 dpi) stays legible at 200 % zoom; a 600-dpi scan comes down to about 360 dpi.
 */
export const SHEET_LARGE_PX = 6000;
const formats = { tiff: 'image/tiff' };
const extension: Record<string, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/tiff': 'tif', 'image/webp': 'webp', 'image/heif': 'heic', 'image/avif': 'avif' };
const unsupportedMessage = 'That file is not a service sheet Gridleak can read: send a scan as JPEG, PNG or TIFF.';

async function isPdf(path: string): Promise<boolean> {
  const file = await open(path, 'r');
  try {
    const head = Buffer.alloc(5);
    await file.read(head, 0, 5, 0);
    return head.toString('latin1') === '%PDF-';
  } finally {
    await file.close();
  }
}

export function sheetsService({ db, storage, config }: PhotosDeps) {
  const repo = sheetsRepo(db);

  async function toPage(row: SheetPageRow, role: Role): Promise<SheetPage> {
    const keys = sheetKeys(row.storageKey);
    const page = keys.page(row.pageNumber);
    const [thumb, display, large, original] = await Promise.all([
      storage.getSignedUrl(page.thumb),
      storage.getSignedUrl(page.display),
      storage.getSignedUrl(page.large),
      can(role, 'sheets.upload') ? storage.getSignedUrl(keys.original, { downloadName: `sheet-${row.sheetId}.${extension[row.contentType] ?? 'bin'}` }) : undefined,
    ]);
    return {
      id: row.id, restorationId: row.restorationId, sheetId: row.sheetId, pageNumber: row.pageNumber, kind: row.kind, title: row.title,
      ownerVisible: row.ownerVisible, width: row.width, height: row.height, uploadedAt: row.createdAt.toISOString(),
      urls: original ? { thumb, display, large, original } : { thumb, display, large },
    };
  }

  /** A page the caller may see (else 404) and act on (else 403). */
  async function visible(id: number, role: Role, action?: Action): Promise<SheetPageRow> {
    const row = await repo.findPage(id);
    if (!row || !can(role, 'sheets.view', { ownerVisible: row.ownerVisible })) throw new NotFoundError();
    if (action && !can(role, action)) throw new ForbiddenError();
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
     * Stores one uploaded scan as a one-page sheet through the photo pipeline. Objects go up first, the rows
     * last in one transaction; on any failure the objects already stored are deleted.
     */
    async ingest(restorationId: number, file: { path: string; size: number }, rawFields: Record<string, unknown>, uploadedById: number, role: Role, signal?: AbortSignal): Promise<Sheet> {
      const fields = sheetUploadFieldsSchema.safeParse(rawFields);
      if (!fields.success) throw new BadRequestError(fields.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; '));
      if (await isPdf(file.path))
        throw new HttpError(415, 'unsupported_type', 'PDF service sheets are not read yet: export each page as PNG or TIFF (300 dpi keeps small print legible) and send those.');
      const processed = await processPhoto(file.path, { maxPixels: config.uploads.maxPixels }, { formats, largePx: SHEET_LARGE_PX, unsupportedMessage });
      const storageKey = `${restorationId}/${randomUUID()}`;
      const keys = sheetKeys(storageKey);
      const page = keys.page(1);
      try {
        signal?.throwIfAborted();
        await storage.putObject(keys.original, createReadStream(file.path), processed.contentType, file.size, { signal });
        await storage.putObject(page.large, processed.large!, 'image/webp', undefined, { signal });
        await storage.putObject(page.display, processed.display, 'image/webp', undefined, { signal });
        await storage.putObject(page.thumb, processed.thumb, 'image/webp', undefined, { signal });
        signal?.throwIfAborted();
        const sheetId = await db.transaction(async (tx) => {
          const id = await sheetsRepo(tx).insertSheet({ restorationId, storageKey, contentType: processed.contentType, sizeBytes: file.size, uploadedById });
          await sheetsRepo(tx).insertPage({ sheetId: id, restorationId, pageNumber: 1, ...fields.data, width: processed.width, height: processed.height });
          return id;
        });
        const pages = await Promise.all((await repo.pagesOf(sheetId)).map((r) => toPage(r, role)));
        return { id: sheetId, restorationId, contentType: processed.contentType, pages };
      } catch (err) {
        await deleteSheetObjects(storage, storageKey).catch(() => {});
        if (signal?.aborted) throw new BadRequestError('The upload was cancelled before it was stored.');
        throw err;
      }
    },
    async update(id: number, patch: SheetPagePatch, role: Role) {
      await visible(id, role, 'sheets.edit');
      await repo.updatePage(id, patch);
      return toPage((await repo.findPage(id))!, role);
    },
    /** Deletes the page (and the sheet with its objects when it was the last page). */
    async remove(id: number, role: Role) {
      await visible(id, role, 'sheets.edit');
      const storageKey = await db.transaction((tx) => sheetsRepo(tx).removePage(id));
      if (storageKey) await deleteSheetObjects(storage, storageKey).catch(() => {});
    },
    restorationOfPage: (id: number) => repo.restorationOfPage(id),
  };
}
