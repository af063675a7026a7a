import type { Logger } from 'pino';
import type { Database } from '../../db/client';
import { photos } from '../../db/schema';
import type { Storage } from '../../storage';
import { photoKeys } from './photo-objects';
import { phoneVariant } from './photo-pipeline';

/**
 * One-off backfill, safe to run at every start: photos stored before the phone variant existed get it,
 * cut from their display image. Photos that already have it are only checked (one HEAD each).
 */
export async function backfillPhoneVariants(
  db: Database,
  storage: Storage,
  logger?: Pick<Logger, 'info' | 'warn'>,
): Promise<number> {
  const rows = await db.select({ id: photos.id, storageKey: photos.storageKey }).from(photos);
  let made = 0;
  for (const row of rows) {
    const keys = photoKeys(row.storageKey);
    if (await storage.exists(keys.phone)) continue;
    try {
      const display = await storage.getObject(keys.display);
      await storage.putObject(keys.phone, await phoneVariant(display), 'image/webp');
      made += 1;
    } catch (err) {
      logger?.warn({ err, photoId: row.id }, 'could not make the phone variant of a photo');
    }
  }
  if (made) logger?.info(`Made the phone-sized variant of ${made} photo(s).`);
  return made;
}
