import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { precompressPlugin } from './server/client-serving/precompress.ts';

export default defineConfig({
  plugins: [react(), tailwindcss(), precompressPlugin()],
  // Static files live inside src/ so the top level holds only what the tools expect.
  publicDir: 'src/public',
  // Source maps are written to the build folder for debugging but not referenced from the bundles
  // (and the server never serves *.map).
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: 'hidden' },
});
