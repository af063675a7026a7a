import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import type { Plugin } from 'vite';

/** Text files worth compressing; images and fonts are compressed formats already. */
const COMPRESSIBLE = /\.(js|mjs|css|html|svg|json|txt|webmanifest)$/;
const MIN_BYTES = 1024;

/** Writes `<file>.br` (quality 11) and `<file>.gz` (level 9) beside every compressible file under `dir`. */
export function precompressDirectory(dir: string): number {
  let written = 0;
  for (const name of readdirSync(dir)) {
    const file = path.join(dir, name);
    if (statSync(file).isDirectory()) {
      written += precompressDirectory(file);
      continue;
    }
    if (!COMPRESSIBLE.test(name)) continue;
    const bytes = readFileSync(file);
    if (bytes.length < MIN_BYTES) continue;
    writeFileSync(
      `${file}.br`,
      brotliCompressSync(bytes, {
        params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: bytes.length },
      }),
    );
    writeFileSync(`${file}.gz`, gzipSync(bytes, { level: 9 }));
    written += 1;
  }
  return written;
}

/** Vite plugin: once the bundle is written, precompress it so the server never compresses assets per request. */
export function precompressPlugin(): Plugin {
  let outDir = 'dist';
  return {
    name: 'gridleak-precompress',
    apply: 'build',
    configResolved(config) {
      outDir = path.resolve(config.root, config.build.outDir);
    },
    closeBundle() {
      precompressDirectory(outDir);
    },
  };
}
