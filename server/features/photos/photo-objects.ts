import type { Storage } from '../../storage';

/** Object keys of one photo, built from ids only. */
export const photoKeys = (storageKey: string) => ({
  original: `photos/${storageKey}/original`,
  display: `photos/${storageKey}/display.webp`,
  phone: `photos/${storageKey}/phone.webp`,
  thumb: `photos/${storageKey}/thumb.webp`,
});

/** The storage key a photo object belongs to (`photos/<restorationId>/<uuid>/…`). */
export const storageKeyOf = (objectKey: string) => objectKey.split('/').slice(1, 3).join('/');

/** Deletes every object of a photo: its variants and any close-ups cut from it. */
export async function deletePhotoObjects(storage: Storage, storageKey: string): Promise<void> {
  const keys = new Set(Object.values(photoKeys(storageKey)));
  for await (const o of storage.listObjects(`photos/${storageKey}/`)) keys.add(o.key);
  await Promise.all([...keys].map((k) => storage.deleteObject(k)));
}
