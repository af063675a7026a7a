import { crc32, deflateSync } from 'node:zlib';
import { seededRandom } from './svg-kit';

/**
 * Seamless noise tiles, made here as small grey-and-alpha PNGs and repeated by SVG
 * patterns. librsvg's feTurbulence costs hundreds of milliseconds per use at this
 * picture size; a repeated image costs a few.
 */

/** Encodes grey+alpha pixels (two bytes each, row by row) as a PNG data URI. */
function pngDataUri(w: number, h: number, pixels: Uint8Array): string {
  const chunk = (type: string, body: Buffer): Buffer => {
    const typed = Buffer.concat([Buffer.from(type, 'latin1'), body]);
    const head = Buffer.alloc(4);
    head.writeUInt32BE(body.length);
    const tail = Buffer.alloc(4);
    tail.writeUInt32BE(crc32(typed) >>> 0);
    return Buffer.concat([head, typed, tail]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr[8] = 8; // bits per channel
  ihdr[9] = 4; // grey + alpha
  const stride = w * 2;
  const raw = Buffer.alloc((stride + 1) * h);
  for (let y = 0; y < h; y++) raw.set(pixels.subarray(y * stride, (y + 1) * stride), y * (stride + 1) + 1);
  const png = Buffer.concat([
    Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
  return `data:image/png;base64,${png.toString('base64')}`;
}

/** Turns signed values (about -1..1) into white or black pixels whose alpha grows with |v|. */
function toPixels(values: Float32Array, gain: number): Uint8Array {
  const out = new Uint8Array(values.length * 2);
  values.forEach((v, i) => {
    out[i * 2] = v > 0 ? 255 : 0;
    out[i * 2 + 1] = Math.min(255, Math.round(Math.abs(v) * gain));
  });
  return out;
}

/** Wrapping box blur along x then y, so the tile stays seamless. */
function blur(v: Float32Array, n: number, radius: number, alongX: boolean, alongY: boolean): Float32Array {
  let src = v;
  const pass = (dx: number, dy: number): void => {
    const dst = new Float32Array(src.length);
    for (let y = 0; y < n; y++) {
      for (let x = 0; x < n; x++) {
        let sum = 0;
        for (let k = -radius; k <= radius; k++) sum += src[((y + dy * k + n) % n) * n + ((x + dx * k + n) % n)] ?? 0;
        dst[y * n + x] = sum / (2 * radius + 1);
      }
    }
    src = dst;
  };
  if (alongX) pass(1, 0);
  if (alongY) pass(0, 1);
  return src;
}

function normalise(v: Float32Array): Float32Array {
  let max = 1e-6;
  for (const x of v) max = Math.max(max, Math.abs(x));
  return v.map((x) => x / max);
}

function randomField(n: number, seed: number): Float32Array {
  const rnd = seededRandom(seed);
  return Float32Array.from({ length: n * n }, () => rnd() * 2 - 1);
}

/** Fine sensor grain, 256 px square. */
export function grainTile(seed: number): string {
  return pngDataUri(256, 256, toPixels(randomField(256, seed), 60));
}

/** Rolled-steel streaks running left to right, 256 px square. */
export function streakTile(seed: number): string {
  const n = 256;
  return pngDataUri(n, n, toPixels(normalise(blur(randomField(n, seed), n, 24, true, false)), 150));
}

/** Soft mottling, 64 px square, meant to be drawn several times larger. */
export function mottleTile(seed: number): string {
  const n = 64;
  return pngDataUri(
    n,
    n,
    toPixels(normalise(blur(blur(randomField(n, seed), n, 4, true, true), n, 3, true, true)), 200),
  );
}
