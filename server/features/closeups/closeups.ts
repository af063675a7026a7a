import { createHash } from 'node:crypto';
import { sql } from 'drizzle-orm';
import sharp from 'sharp';
import type { NormalisedPoint, Shape } from '../../../shared/schemas/findings';
import type { AppDeps } from '../../app-deps';
import { redactedError } from '../../http/redact-error';
import { photoKeys } from '../photos/photo-objects';
import { withDecodeSlot } from '../photos/photo-pipeline';
import { closeupRegion } from './closeup-region';

interface FindingLike {
  id: number;
  shape: Shape;
  points: NormalisedPoint[];
}
interface PhotoLike {
  storageKey: string;
  width: number;
  height: number;
}
export type CloseupDeps = Pick<AppDeps, 'db' | 'storage'> & { config: Pick<AppDeps['config'], 'uploads'> };

/** Cached per finding and geometry: moving the mark makes a new key, the old one is swept with its photo. */
export function closeupKey(photo: PhotoLike, finding: FindingLike): string {
  const hash = createHash('sha256')
    .update(JSON.stringify([finding.shape, finding.points]))
    .digest('hex')
    .slice(0, 12);
  return `photos/${photo.storageKey}/closeups/${finding.id}-${hash}.webp`;
}

/** Generations running in this process, by key: a second caller waits for the first instead of decoding again. */
const inFlight = new Map<string, Promise<string>>();

/**
 * A crop of the marked area from the original (upright, metadata stripped), made once and kept in storage.
 * The original is decoded under the upload limits (same pixel cap, same decode slots); one generation per
 * key at a time, in this process (shared promise) and across instances (an advisory lock, then a second look).
 */
export function ensureCloseup(deps: CloseupDeps, photo: PhotoLike, finding: FindingLike): Promise<string> {
  const key = closeupKey(photo, finding);
  const running = inFlight.get(key);
  if (running) return running;
  const job = generate(deps, key, photo, finding).finally(() => inFlight.delete(key));
  inFlight.set(key, job);
  return job;
}

async function generate(
  { db, storage, config }: CloseupDeps,
  key: string,
  photo: PhotoLike,
  finding: FindingLike,
): Promise<string> {
  if (await storage.exists(key)) return key;
  // The decode slot first, then the lock: at most two transactions per instance wait on storage and sharp,
  // so a report with many close-ups cannot hold the whole connection pool.
  return withDecodeSlot(() =>
    db.transaction(async (tx) => {
      await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${key}, 0))`);
      if (await storage.exists(key)) return key; // another instance made it while we waited
      const original = await storage.getObject(photoKeys(photo.storageKey).original);
      const region = closeupRegion(finding.shape, finding.points, photo);
      const crop = await sharp(original, { limitInputPixels: config.uploads.maxPixels, failOn: 'error' })
        .autoOrient()
        .extract(region)
        .resize({ width: 800, height: 800, fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 85 })
        .toBuffer();
      await storage.putObject(key, crop, 'image/webp');
      return key;
    }),
  );
}

/** Cuts the close-up in the background once a finding is placed or moved, so the first view does not wait. */
export function scheduleCloseup(
  deps: CloseupDeps & Pick<AppDeps, 'logger'>,
  photo: PhotoLike,
  finding: FindingLike,
): void {
  setImmediate(() => {
    ensureCloseup(deps, photo, finding).catch((err: unknown) =>
      deps.logger.warn({ err: redactedError(err) }, `close-up for finding ${finding.id} failed`),
    );
  });
}
