import { createHash } from 'node:crypto';
import sharp from 'sharp';
import type { NormalisedPoint, Shape } from '../../../shared/schemas/findings';
import type { Storage } from '../../storage';
import { photoKeys } from '../photos/photo-objects';
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

/** Cached per finding and geometry: moving the mark makes a new key, the old one is swept with its photo. */
export function closeupKey(photo: PhotoLike, finding: FindingLike): string {
  const hash = createHash('sha256').update(JSON.stringify([finding.shape, finding.points])).digest('hex').slice(0, 12);
  return `photos/${photo.storageKey}/closeups/${finding.id}-${hash}.webp`;
}

/** A crop of the marked area from the original (upright, metadata stripped), made once and kept in storage. */
export async function ensureCloseup(storage: Storage, photo: PhotoLike, finding: FindingLike): Promise<string> {
  const key = closeupKey(photo, finding);
  if (await storage.exists(key)) return key;
  const original = await storage.getObject(photoKeys(photo.storageKey).original);
  const region = closeupRegion(finding.shape, finding.points, photo);
  const crop = await sharp(original, { limitInputPixels: false })
    .autoOrient()
    .extract(region)
    .resize({ width: 800, height: 800, fit: 'inside', withoutEnlargement: true })
    .webp({ quality: 85 })
    .toBuffer();
  await storage.putObject(key, crop, 'image/webp');
  return key;
}
