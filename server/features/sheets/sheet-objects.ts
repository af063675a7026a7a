import type { Storage } from '../../storage';

/** Object keys of one service sheet file and its pages, built from ids only. */
export const sheetKeys = (storageKey: string) => ({
  original: `sheets/${storageKey}/original`,
  page: (pageNumber: number) => ({
    large: `sheets/${storageKey}/p${pageNumber}/large.webp`,
    display: `sheets/${storageKey}/p${pageNumber}/display.webp`,
    thumb: `sheets/${storageKey}/p${pageNumber}/thumb.webp`,
  }),
});

/** Deletes every object of a sheet (its original and every page's variants), or of one page only. */
export async function deleteSheetObjects(storage: Storage, storageKey: string, pageNumber?: number): Promise<void> {
  const keys: string[] = [];
  for await (const o of storage.listObjects(
    pageNumber ? `sheets/${storageKey}/p${pageNumber}/` : `sheets/${storageKey}/`,
  ))
    keys.push(o.key);
  await Promise.all(keys.map((k) => storage.deleteObject(k)));
}
