import type { Database } from '../../db/client';
import type { Storage } from '../../storage';
import { storageKeyOf } from './photo-objects';
import { photosRepo } from './photos.repo';

export const ORPHAN_AGE_MS = 24 * 60 * 60 * 1000;

/**
 * Deletes photo objects that no row refers to and that are older than a day (younger ones may belong to
 * an upload still in progress on another instance). Safe to run on several instances at once.
 */
export async function sweepOrphanedObjects(
  db: Database,
  storage: Storage,
  olderThanMs = ORPHAN_AGE_MS,
): Promise<number> {
  const cutoff = Date.now() - olderThanMs;
  const candidates = new Map<string, string[]>();
  for await (const o of storage.listObjects('photos/')) {
    if (o.lastModified.getTime() > cutoff) continue;
    const key = storageKeyOf(o.key);
    candidates.set(key, [...(candidates.get(key) ?? []), o.key]);
  }
  const existing = await photosRepo(db).existingKeys([...candidates.keys()]);
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
