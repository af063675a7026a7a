import type { Storage } from '../../storage';

/** Object keys of one photo, built from ids only. */
export const photoKeys = (storageKey: string) => ({
  original: `photos/${storageKey}/original`,
  display: `photos/${storageKey}/display.webp`,
  thumb: `photos/${storageKey}/thumb.webp`,
});

/** The storage key a photo object belongs to (`photos/<restorationId>/<uuid>/…`). */
export const storageKeyOf = (objectKey: string) => objectKey.split('/').slice(1, 3).join('/');

export async function deletePhotoObjects(storage: Storage, storageKey: string): Promise<void> {
  await Promise.all(Object.values(photoKeys(storageKey)).map((k) => storage.deleteObject(k)));
}
