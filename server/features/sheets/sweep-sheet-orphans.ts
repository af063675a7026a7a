import { inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { sheetPages, sheets } from '../../db/schema';
import type { Storage } from '../../storage';
import { ORPHAN_AGE_MS } from '../photos/sweep-orphans';

/** `sheets/<restorationId>/<uuid>/p3/large.webp` → the sheet's storage key and the page folder (`p3`), if any. */
function partsOf(objectKey: string): { sheetKey: string; page?: string } {
  const parts = objectKey.split('/');
  const page = parts.length > 4 && /^p\d+$/.test(parts[3]!) ? parts[3] : undefined;
  return { sheetKey: parts.slice(1, 3).join('/'), page };
}

/**
 * Deletes service sheet objects (`sheets/<restorationId>/<uuid>/…`) older than a day that no row names: those of
 * a sheet whose row is gone, and those of a page (`…/p<n>/…`) whose row is gone while the sheet stays (a page
 * deleted from a longer sheet). Such objects are left by a crash between a commit and its object deletion, or
 * during an upload.
 */
export async function sweepOrphanedSheetObjects(
  db: Database,
  storage: Storage,
  olderThanMs = ORPHAN_AGE_MS,
): Promise<number> {
  const cutoff = Date.now() - olderThanMs;
  const candidates: string[] = [];
  for await (const o of storage.listObjects('sheets/')) if (o.lastModified.getTime() <= cutoff) candidates.push(o.key);
  if (!candidates.length) return 0;
  const sheetKeys = [...new Set(candidates.map((k) => partsOf(k).sheetKey))];
  const sheetRows = await db
    .select({ id: sheets.id, key: sheets.storageKey })
    .from(sheets)
    .where(inArray(sheets.storageKey, sheetKeys));
  const keyOfSheet = new Map(sheetRows.map((r) => [r.id, r.key]));
  const pageRows = sheetRows.length
    ? await db
        .select({ sheetId: sheetPages.sheetId, pageNumber: sheetPages.pageNumber })
        .from(sheetPages)
        .where(inArray(sheetPages.sheetId, [...keyOfSheet.keys()]))
    : [];
  const existingSheets = new Set(keyOfSheet.values());
  const existingPages = new Set(pageRows.map((p) => `${keyOfSheet.get(p.sheetId)}/p${p.pageNumber}`));
  let deleted = 0;
  for (const objectKey of candidates) {
    const { sheetKey, page } = partsOf(objectKey);
    const kept = existingSheets.has(sheetKey) && (page === undefined || existingPages.has(`${sheetKey}/${page}`));
    if (kept) continue;
    await storage.deleteObject(objectKey);
    deleted++;
  }
  return deleted;
}
