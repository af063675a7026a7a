import { inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { sheets } from '../../db/schema';
import type { Storage } from '../../storage';
import { ORPHAN_AGE_MS } from '../photos/sweep-orphans';

/**
 * Deletes service sheet objects (`sheets/<restorationId>/<uuid>/…`) that no sheet row names and that are older
 * than a day: left by a crash between a commit and its object deletion, or during an upload.
 */
export async function sweepOrphanedSheetObjects(db: Database, storage: Storage, olderThanMs = ORPHAN_AGE_MS): Promise<number> {
  const cutoff = Date.now() - olderThanMs;
  const candidates = new Map<string, string[]>();
  for await (const o of storage.listObjects('sheets/')) {
    if (o.lastModified.getTime() > cutoff) continue;
    const key = o.key.split('/').slice(1, 3).join('/');
    candidates.set(key, [...(candidates.get(key) ?? []), o.key]);
  }
  if (!candidates.size) return 0;
  const rows = await db.select({ key: sheets.storageKey }).from(sheets).where(inArray(sheets.storageKey, [...candidates.keys()]));
  const existing = new Set(rows.map((r) => r.key));
  let deleted = 0;
  for (const [key, objects] of candidates) {
    if (existing.has(key)) continue;
    for (const objectKey of objects) {
      await storage.deleteObject(objectKey);
      deleted++;
    }
  }
  return deleted;
}
