/** What a photo needs to be offered at several sizes (the API's photo has it). */
export type SizedPhoto = { width: number; height: number; urls: { thumb: string; phone: string; display: string } };

/** The longest side of each stored variant (server/features/photos/photo-pipeline.ts); none is enlarged. */
const VARIANTS = [
  { key: 'thumb', px: 400 },
  { key: 'phone', px: 1280 },
  { key: 'display', px: 2560 },
] as const;

/** Pixel width of a variant of this photo, or its nominal size when the photo's size is unknown. */
function variantWidth(photo: SizedPhoto, px: number): number {
  if (!photo.width || !photo.height) return px;
  return Math.round(photo.width * Math.min(1, px / Math.max(photo.width, photo.height)));
}

/**
 * `src`, `srcSet` and `sizes` for an <img> of a photo: the browser picks the smallest variant that fills
 * `sizes` at the screen's pixel density (a phone gets the thumbnail or the 1,280 px variant, never 2,560).
 */
export function photoSources(photo: SizedPhoto, sizes: string) {
  const seen = new Set<number>();
  const candidates: string[] = [];
  for (const v of VARIANTS) {
    const w = variantWidth(photo, v.px);
    if (seen.has(w)) continue; // a small original: the larger variants are the same size
    seen.add(w);
    candidates.push(`${photo.urls[v.key]} ${w}w`);
  }
  return { src: photo.urls.phone, srcSet: candidates.join(', '), sizes };
}

/** `sizes` for an image as wide as the owner's column (max-w-2xl with the page's padding). */
export const OWNER_COLUMN_SIZES = '(min-width: 704px) 672px, calc(100vw - 32px)';
