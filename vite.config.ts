import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  // Static files live inside src/ so the top level holds only what the tools expect.
  publicDir: 'src/public',
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: true },
});
