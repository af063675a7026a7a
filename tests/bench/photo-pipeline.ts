/**
 * Benchmark (prints ratios measured in one run; no assertions):
 * 1. a 6000×4000 JPEG uploaded through the API until its variants are stored, against bare sharp making
 *    the same variants from the same file in the same run (goal ≤ 1.3×);
 * 2. the server's peak RSS during 8 concurrent uploads (goal < 600 MB).
 * Run: npx tsx tests/bench/photo-pipeline.ts
 */
import { readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { DISPLAY_PX, PHONE_PX, THUMB_PX } from '../../server/features/photos/photo-pipeline';
import { againstBareSharp, median, startBenchServer, timed } from './upload-bench';

const peakRssMb = (pid: number) =>
  Number(/VmHWM:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))![1]) / 1024;

async function photoLikeJpeg(file: string) {
  // Smooth gradients with fine grain: compresses like a real photo (a few MB), not like noise or flat colour.
  const noise = await sharp({
    create: {
      width: 6000,
      height: 4000,
      channels: 3,
      background: '#808080',
      noise: { type: 'gaussian', mean: 128, sigma: 40 },
    },
  })
    .blur(1.2)
    .jpeg()
    .toBuffer();
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="6000" height="4000"><defs><linearGradient id="g"><stop offset="0" stop-color="#6d6a63"/><stop offset="1" stop-color="#c9c2b3"/></linearGradient></defs><rect width="6000" height="4000" fill="url(#g)"/><circle cx="3000" cy="2000" r="900" fill="#3a2a1a"/></svg>`;
  const out = await sharp(Buffer.from(svg))
    .composite([{ input: noise, blend: 'soft-light' }])
    .jpeg({ quality: 88 })
    .toBuffer();
  writeFileSync(file, out);
  return out;
}

async function bareSharp(file: string) {
  const display = await sharp(file)
    .autoOrient()
    .resize({ width: DISPLAY_PX, height: DISPLAY_PX, fit: 'inside' })
    .webp({ quality: 82 })
    .toBuffer();
  await Promise.all([
    sharp(display).resize({ width: PHONE_PX, height: PHONE_PX, fit: 'inside' }).webp({ quality: 78 }).toBuffer(),
    sharp(display).resize({ width: THUMB_PX, height: THUMB_PX, fit: 'inside' }).webp({ quality: 75 }).toBuffer(),
  ]);
}

const server = await startBenchServer();
try {
  const child = server.child;
  const serverPid = Number(
    readFileSync(`/proc/${child.pid}/task/${child.pid}/children`, 'utf8').trim().split(/\s+/)[0] || child.pid,
  );
  const file = path.join(os.tmpdir(), 'gridleak-bench-6000x4000.jpg');
  const jpeg = await photoLikeJpeg(file);
  const photo = new Blob([new Uint8Array(jpeg)], { type: 'image/jpeg' });
  const upload = () => server.upload('photos', { view: 'underside' }, photo, 'bench.jpg');
  const { api, bare } = await againstBareSharp(upload, () => bareSharp(file));
  const before = peakRssMb(serverPid);
  const burst = await timed(() => Promise.all(Array.from({ length: 8 }, upload)).then(() => undefined));
  const peak = peakRssMb(serverPid);
  console.log(
    `\nphoto pipeline, ${(jpeg.length / 1024 / 1024).toFixed(1)} MB 6000×4000 JPEG, medians of 5 on this machine (${os.cpus().length} cores):`,
  );
  console.log(
    `  bare sharp (display ${DISPLAY_PX} px + phone ${PHONE_PX} px + thumb ${THUMB_PX} px WebP): ${median(bare).toFixed(0)} ms`,
  );
  console.log(`  upload through the API until stored:                ${median(api).toFixed(0)} ms`);
  console.log(`  ratio: ${(median(api) / median(bare)).toFixed(2)}× (goal ≤ 1.3×)`);
  console.log(
    `  8 concurrent uploads: ${(burst / 1000).toFixed(1)} s; server peak RSS ${peak.toFixed(0)} MB (${before.toFixed(0)} MB before; goal < 600 MB)`,
  );
} finally {
  await server.stop();
}
