/**
 * Benchmark (prints a ratio measured in one run; no assertions): a 300-dpi A3 scan (4,961 × 3,508 px, PNG)
 * uploaded as a service sheet page until it is ready to view (original and variants stored, rows written),
 * against bare sharp making the same variants (large, display, thumbnail WebP) from the same file in the
 * same run. Goal < 1.3×.
 * Run: npx tsx tests/bench/sheet-pipeline.ts
 */
import { writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { DISPLAY_PX, THUMB_PX } from '../../server/features/photos/photo-pipeline';
import { SHEET_LARGE_PX } from '../../server/features/sheets/sheet-ingest';
import { againstBareSharp, median, startBenchServer } from './upload-bench';

// A3 is 420 × 297 mm (ISO 216); at 300 dpi (25.4 mm to the inch) that is 4,961 × 3,508 px.
const W = 4961;
const H = 3508;

/** A diagram-like scan: white paper with a light grain, thin lines, boxes and small print. */
async function a3Scan(file: string) {
  const lines: string[] = [];
  for (let i = 0; i < 60; i++)
    lines.push(`<path d="M${100 + i * 78} 200 V${H - 200}" stroke="#111" stroke-width="2"/>`);
  for (let j = 0; j < 40; j++)
    lines.push(`<path d="M100 ${220 + j * 80} H${W - 100}" stroke="#111" stroke-width="2"/>`);
  for (let k = 0; k < 300; k++) {
    const x = 150 + ((k * 211) % (W - 400));
    const y = 260 + ((k * 157) % (H - 500));
    lines.push(
      `<rect x="${x}" y="${y}" width="30" height="90" fill="white" stroke="#111" stroke-width="3"/><text x="${x + 40}" y="${y + 30}" font-size="25" font-family="sans-serif">R${k + 1} 47k</text>`,
    );
  }
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}"><rect width="${W}" height="${H}" fill="#fbfaf6"/>${lines.join('')}</svg>`;
  const grain = await sharp({
    create: {
      width: W,
      height: H,
      channels: 3,
      background: '#808080',
      noise: { type: 'gaussian', mean: 128, sigma: 6 },
    },
  })
    .png()
    .toBuffer();
  const out = await sharp(Buffer.from(svg))
    .composite([{ input: grain, blend: 'soft-light' }])
    .png()
    .toBuffer();
  writeFileSync(file, out);
  return out;
}

/** The variants the sheet pipeline keeps, made with nothing but sharp. */
async function bareSharp(file: string) {
  const large = await sharp(file)
    .autoOrient()
    .resize({ width: SHEET_LARGE_PX, height: SHEET_LARGE_PX, fit: 'inside', withoutEnlargement: true })
    .webp({ quality: 90 })
    .toBuffer();
  const display = await sharp(large)
    .resize({ width: DISPLAY_PX, height: DISPLAY_PX, fit: 'inside', withoutEnlargement: true })
    .webp({ quality: 82 })
    .toBuffer();
  await sharp(display).resize({ width: THUMB_PX, height: THUMB_PX, fit: 'inside' }).webp({ quality: 75 }).toBuffer();
}

const server = await startBenchServer();
try {
  const file = path.join(os.tmpdir(), 'gridleak-bench-a3-300dpi.png');
  const png = await a3Scan(file);
  const scan = new Blob([new Uint8Array(png)], { type: 'image/png' });
  const { api, bare } = await againstBareSharp(
    () => server.upload('sheets', { kind: 'circuit-diagram' }, scan, 'a3.png'),
    () => bareSharp(file),
  );
  console.log(
    `\nsheet pipeline, ${(png.length / 1024 / 1024).toFixed(1)} MB ${W}×${H} PNG (A3 at 300 dpi), medians of 5 on this machine (${os.cpus().length} cores, load average ${os.loadavg()[0]!.toFixed(1)}):`,
  );
  console.log(
    `  bare sharp (large ${SHEET_LARGE_PX} px + display ${DISPLAY_PX} px + thumb ${THUMB_PX} px WebP): ${median(bare).toFixed(0)} ms`,
  );
  console.log(`  upload through the API until ready to view:                  ${median(api).toFixed(0)} ms`);
  console.log(`  ratio: ${(median(api) / median(bare)).toFixed(2)}× (goal < 1.3×)`);
} finally {
  await server.stop();
}
