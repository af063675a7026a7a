import { randomBytes } from 'node:crypto';
import type { Database } from '../../server/db/client';
import { photosRepo } from '../../server/features/photos/photos.repo';

/** A photo row (no objects needed for finding and thread tests), shared with the owner or not. */
export function createPhotoRow(db: Database, restorationId: number, ownerVisible = false) {
  return photosRepo(db).insert({
    restorationId,
    storageKey: `${restorationId}/${randomBytes(8).toString('hex')}`,
    view: 'underside',
    phase: 'before',
    width: 2400,
    height: 1600,
    contentType: 'image/jpeg',
    sizeBytes: 1000,
    ownerVisible,
  });
}
