import exifReader from 'exif-reader';
import pLimit from 'p-limit';
import sharp, { type Metadata } from 'sharp';
import { HttpError } from '../../http/errors';

/** Formats accepted, decided from the content (sharp's own sniffing), never from the file name. */
const ACCEPTED: Record<string, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
  heif: 'image/heif',
};
export const DISPLAY_PX = 2560;
export const THUMB_PX = 400;
/** The phone variant: sharp on a phone screen (about 400 CSS px at 3×) at a fraction of the display's bytes. */
export const PHONE_PX = 1280;

export interface PipelineLimits {
  /** Decoded pixels allowed (width × height), against decompression bombs. */
  maxPixels: number;
}

/** What a caller other than chassis photos may ask of the pipeline (service sheet pages). */
export interface PipelineOptions {
  /** Further formats accepted, as sharp names them → content type (e.g. `{ tiff: 'image/tiff' }`). */
  formats?: Record<string, string>;
  /** Also keep a large variant up to this many px on the long side (thin lines, small print). */
  largePx?: number;
  /** What a refused file is told (415). */
  unsupportedMessage?: string;
  /** `false`: no phone variant is made (service sheet pages are read on the large variant); `phone` is then empty. */
  phone?: false;
}

export interface ProcessedPhoto {
  contentType: string;
  width: number;
  height: number;
  takenAt: Date | null;
  display: Buffer;
  phone: Buffer;
  thumb: Buffer;
  /** Only when `largePx` was asked for. */
  large?: Buffer;
}

// libvips' operation cache only helps repeated work on the same image; uploads never repeat.
sharp.cache(false);
/** At most two decodes at a time per instance: a burst of uploads queues instead of exhausting memory. */
const decodeSlots = pLimit(2);
/** Runs image work in one of the same two decode slots uploads use (close-ups share them). */
export const withDecodeSlot = <T>(work: () => Promise<T>) => decodeSlots(work);

const unsupported = (message?: string) =>
  new HttpError(
    415,
    'unsupported_type',
    message ??
      'That file is not a photo Gridleak can read: send JPEG, PNG, WebP or AVIF (HEIC may need exporting as JPEG).',
  );

/** Checks, orients and resizes one uploaded image (a file or bytes); served variants carry no metadata (GPS above all). */
export function processPhoto(
  path: string | Buffer,
  limits: PipelineLimits,
  options: PipelineOptions = {},
): Promise<ProcessedPhoto> {
  return decodeSlots(async () => {
    const open = () => sharp(path, { limitInputPixels: limits.maxPixels, failOn: 'error', sequentialRead: true });
    let meta: Metadata;
    try {
      meta = await sharp(path, { limitInputPixels: false }).metadata();
    } catch {
      throw unsupported(options.unsupportedMessage);
    }
    const contentType = { ...ACCEPTED, ...options.formats }[meta.format ?? ''];
    if (!contentType || !meta.width || !meta.height) throw unsupported(options.unsupportedMessage);
    if (meta.width * meta.height > limits.maxPixels)
      throw new HttpError(
        413,
        'too_large',
        `The image is ${meta.width}×${meta.height} pixels; the limit is ${Math.round(limits.maxPixels / 1e6)} megapixels.`,
      );
    const rotated = (meta.orientation ?? 1) >= 5;
    try {
      // A large variant is read once from the original; the display image then comes from it.
      const large = options.largePx
        ? await open()
            .autoOrient()
            .resize({ width: options.largePx, height: options.largePx, fit: 'inside', withoutEnlargement: true })
            .webp({ quality: 90 })
            .toBuffer()
        : undefined;
      const display = await (large ? sharp(large) : open().autoOrient())
        .resize({ width: DISPLAY_PX, height: DISPLAY_PX, fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 82 })
        .toBuffer();
      // The smaller variants come from the display image: far less to decode than the original.
      const [phone, thumb] = await Promise.all([
        options.phone === false ? Buffer.alloc(0) : phoneVariant(display),
        sharp(display).resize({ width: THUMB_PX, height: THUMB_PX, fit: 'inside' }).webp({ quality: 75 }).toBuffer(),
      ]);
      return {
        contentType: meta.format === 'heif' && meta.compression === 'av1' ? 'image/avif' : contentType,
        width: rotated ? meta.height : meta.width,
        height: rotated ? meta.width : meta.height,
        takenAt: captureTime(meta.exif),
        display,
        phone,
        thumb,
        ...(large ? { large } : {}),
      };
    } catch {
      throw new HttpError(
        400,
        'damaged_image',
        'The image is damaged or incomplete; try sending it again, or export it afresh.',
      );
    }
  });
}

/** The phone-sized variant from a display image (also used to backfill photos stored before it existed). */
export function phoneVariant(display: Buffer): Promise<Buffer> {
  return sharp(display)
    .resize({ width: PHONE_PX, height: PHONE_PX, fit: 'inside', withoutEnlargement: true })
    .webp({ quality: 78 })
    .toBuffer();
}

function captureTime(exif: Buffer | undefined): Date | null {
  if (!exif) return null;
  try {
    const tags = exifReader(exif) as { Photo?: { DateTimeOriginal?: Date }; Image?: { DateTime?: Date } };
    const when = tags.Photo?.DateTimeOriginal ?? tags.Image?.DateTime;
    return when instanceof Date && !Number.isNaN(when.getTime()) ? when : null;
  } catch {
    return null;
  }
}
