import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { readFile } from 'node:fs/promises';
import sharp from 'sharp';
import { HttpError } from '../../http/errors';
import type { Storage } from '../../storage';
import { processPhoto } from '../photos/photo-pipeline';
import { deleteSheetObjects, sheetKeys } from './sheet-objects';
import { looksLikePdf, renderPdfPages } from './render-pdf';

/**
 * The large variant's long side. A 300-dpi A3 scan (4,960 px) is kept whole, so 6-point print (about 25 px
 * tall at 300 dpi) stays legible at 200 % zoom; a 600-dpi scan comes down to about 360 dpi.
 */
export const SHEET_LARGE_PX = 6000;
const formats = { tiff: 'image/tiff' };
const unsupportedMessage =
  'That file is not a service sheet Gridleak can read: send a PDF, or a scan as JPEG, PNG or TIFF.';

export interface StoredSheet {
  storageKey: string;
  contentType: string;
  pages: { pageNumber: number; width: number; height: number }[];
}

interface IngestOptions {
  restorationId: number;
  maxPixels: number;
  signal?: AbortSignal;
}

/** A page image through the photo pipeline, its three variants stored under the sheet's key. */
async function storePage(
  storage: Storage,
  storageKey: string,
  pageNumber: number,
  source: string | Buffer,
  options: IngestOptions,
) {
  const processed = await processPhoto(
    source,
    { maxPixels: options.maxPixels },
    { formats, largePx: SHEET_LARGE_PX, unsupportedMessage, phone: false },
  );
  const keys = sheetKeys(storageKey).page(pageNumber);
  const { signal } = options;
  signal?.throwIfAborted();
  await Promise.all([
    storage.putObject(keys.large, processed.large!, 'image/webp', undefined, { signal }),
    storage.putObject(keys.display, processed.display, 'image/webp', undefined, { signal }),
    storage.putObject(keys.thumb, processed.thumb, 'image/webp', undefined, { signal }),
  ]);
  return { pageNumber, width: processed.width, height: processed.height, contentType: processed.contentType };
}

/**
 * Stores an uploaded service sheet's objects: the original as sent and every page's variants. A PDF (told by
 * its first bytes, never by its name) is drawn page by page; a scan is one page. On any failure the objects
 * already stored are deleted, so the caller writes its rows only once this has returned.
 */
export async function storeSheetFile(
  storage: Storage,
  file: { path: string; size: number; mimeType: string },
  options: IngestOptions,
): Promise<StoredSheet> {
  const storageKey = `${options.restorationId}/${randomUUID()}`;
  const keys = sheetKeys(storageKey);
  const { signal } = options;
  let original: Promise<unknown> | undefined;
  try {
    const pdf = await looksLikePdf(file.path);
    if (!pdf && file.mimeType === 'application/pdf')
      throw new HttpError(
        415,
        'unsupported_type',
        'That file is named as a PDF but is not one (a PDF starts with "%PDF-"). Export the service sheet as a PDF again, or send the pages as scans.',
      );
    const pages: StoredSheet['pages'] = [];
    let contentType = 'application/pdf';
    // The original goes up while the pages are drawn; a scan's type is known once the pipeline has read it.
    const storeOriginal = (type: string) =>
      storage.putObject(keys.original, createReadStream(file.path), type, file.size, { signal });
    if (pdf) {
      original = storeOriginal(contentType);
      original.catch(() => {});
      const data = new Uint8Array(await readFile(file.path));
      for await (const page of renderPdfPages(
        data,
        { longSidePx: SHEET_LARGE_PX, maxPixels: options.maxPixels },
        signal,
      ))
        pages.push(await storePage(storage, storageKey, page.pageNumber, page.png, options));
    } else {
      // The header tells a scan's type at once, so its original goes up while the variants are made.
      const format = (
        await sharp(file.path)
          .metadata()
          .catch(() => undefined)
      )?.format;
      const known =
        format && { jpeg: 'image/jpeg', png: 'image/png', tiff: 'image/tiff', webp: 'image/webp' }[format as string];
      if (known) {
        original = storeOriginal(known);
        original.catch(() => {});
      }
      const page = await storePage(storage, storageKey, 1, file.path, options);
      contentType = page.contentType;
      pages.push(page);
    }
    if (!pages.length) throw new HttpError(415, 'unsupported_type', 'That PDF has no pages.');
    signal?.throwIfAborted();
    await (original ?? storeOriginal(contentType));
    return {
      storageKey,
      contentType,
      pages: pages.map(({ pageNumber, width, height }) => ({ pageNumber, width, height })),
    };
  } catch (err) {
    await original?.catch(() => {});
    await deleteSheetObjects(storage, storageKey).catch(() => {});
    throw err;
  }
}
