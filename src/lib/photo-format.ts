import { statuses, statusLabels, type Status } from '../../shared/schemas/findings';
import { phaseLabels, viewLabels, type Photo } from '../../shared/schemas/photos';
import { formatDateTime } from './format';

/** What the server accepts (never SVG: it can carry script). HEIC/AVIF come from phones. */
export const acceptedTypes = [
  'image/jpeg',
  'image/png',
  'image/webp',
  'image/heic',
  'image/heif',
  'image/avif',
] as const;
const acceptedExtensions = /\.(jpe?g|png|webp|heic|heif|avif)$/i;

/** Some systems give HEIC files no MIME type, so the file name decides when the type is blank. */
export function isAcceptedImage(file: File): boolean {
  if (file.type) return (acceptedTypes as readonly string[]).includes(file.type.toLowerCase());
  return acceptedExtensions.test(file.name);
}

/** A file size in bytes as people read it: 950 B, 312 kB, 4.2 MB (decimal units, like file managers on phones). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  if (bytes < 1_000_000) return `${Math.round(bytes / 1000)} kB`;
  return `${(bytes / 1_000_000).toFixed(bytes < 10_000_000 ? 1 : 0)} MB`;
}

/** The words that name a photo for screen readers and the lightbox: "Top, before: rectifier area". */
export function photoLabel(photo: Pick<Photo, 'view' | 'phase' | 'caption'>): string {
  const base = `${viewLabels[photo.view]}, ${phaseLabels[photo.phase].toLowerCase()}`;
  return photo.caption ? `${base}: ${photo.caption}` : base;
}

/** When a photo was taken, in the person's locale and zone; null when unknown or unreadable. */
export function takenAt(iso: string | null): string | null {
  return iso ? formatDateTime(iso) || null : null;
}

/** Pixel size of the ~400 px thumbnail, kept to the photo's aspect so the grid does not jump as images arrive. */
export function thumbSize(photo: Pick<Photo, 'width' | 'height'>, longEdge = 400): { width: number; height: number } {
  const { width, height } = photo.width > 0 && photo.height > 0 ? photo : { width: 4, height: 3 };
  const scale = longEdge / Math.max(width, height);
  return { width: Math.round(width * scale), height: Math.round(height * scale) };
}

/** A photo's findings by status, in the order work moves through them, leaving out statuses with none. */
export function findingCountList(
  counts: Partial<Record<Status, number>> | undefined,
): { status: Status; count: number }[] {
  return statuses.flatMap((status) => {
    const count = counts?.[status] ?? 0;
    return count > 0 ? [{ status, count }] : [];
  });
}

/** The same in words for screen readers: "2 observed, 1 confirmed", or "no findings". */
export function findingCountText(counts: Partial<Record<Status, number>> | undefined): string {
  const list = findingCountList(counts);
  return list.length ? list.map((c) => `${c.count} ${statusLabels[c.status].toLowerCase()}`).join(', ') : 'no findings';
}
