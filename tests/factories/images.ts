import { crc32 } from 'node:zlib';
import sharp from 'sharp';

/** A small JPEG whose left half is red and right half blue, so orientation can be checked by pixel. */
export async function twoToneJpeg(width = 600, height = 400): Promise<Buffer> {
  const half = Math.round(width / 2);
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">
    <rect width="${half}" height="${height}" fill="#d00000"/><rect x="${half}" width="${width - half}" height="${height}" fill="#0000d0"/></svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 90 }).toBuffer();
}

/** The same JPEG carrying EXIF: a GPS position, a capture time and orientation 6 (rotate 90° clockwise to view). */
export async function jpegWithGpsAndOrientation6(): Promise<Buffer> {
  return sharp(await twoToneJpeg())
    .withExif({
      IFD0: { Make: 'Bench camera', DateTime: '2026:11:20 14:05:09' },
      IFD2: { DateTimeOriginal: '2026:11:20 14:05:09' },
      IFD3: {
        GPSLatitudeRef: 'N',
        GPSLatitude: '51/1 30/1 2600/100',
        GPSLongitudeRef: 'W',
        GPSLongitude: '0/1 7/1 3900/100',
      },
    })
    .withMetadata({ orientation: 6 })
    .jpeg({ quality: 90 })
    .toBuffer();
}

/** A valid 1×1 PNG whose header is rewritten to claim the given size (a decompression bomb's calling card). */
export async function pngClaiming(width: number, height: number): Promise<Buffer> {
  const png = Buffer.from(
    await sharp({ create: { width: 1, height: 1, channels: 3, background: '#888' } })
      .png()
      .toBuffer(),
  );
  // IHDR data starts at byte 16 (8 signature + 4 length + 4 type); its CRC follows the 13 data bytes.
  png.writeUInt32BE(width, 16);
  png.writeUInt32BE(height, 20);
  png.writeUInt32BE(crc32(png.subarray(12, 29)) >>> 0, 29);
  return png;
}
