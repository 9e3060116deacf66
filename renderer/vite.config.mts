import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

const root = fileURLToPath(new URL('.', import.meta.url));

/**
 * The renderer bundle. `base: './'` keeps every asset URL relative, so the same build loads from the
 * desktop app's own protocol and from the loopback web transport. CW_RENDERER_OUT moves the output
 * (the UI tests and the bench build into a temporary folder).
 */
export default defineConfig({
  root,
  base: './',
  plugins: [react()],
  build: {
    outDir: process.env.CW_RENDERER_OUT ?? fileURLToPath(new URL('../dist/renderer', import.meta.url)),
    emptyOutDir: true,
    target: 'chrome130',
    sourcemap: false,
    reportCompressedSize: false,
    // The bench holds the bundle to its gzipped size; one chunk loads fastest from a local file.
    chunkSizeWarningLimit: 2000,
  },
  logLevel: 'warn',
});
