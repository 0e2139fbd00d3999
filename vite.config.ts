/**
 * Build of the renderer (Vue 3 + Pinia + three.js): root renderer/, output dist/renderer/.
 * base './' so the same build loads from file://, the desktop app protocol and the web host.
 * No remote content; the build contains no eval and no inline scripts (CSP: script-src 'self').
 *
 * The project-file validator (main/common/project) is ajv's precompiled (standalone) code, so the
 * bundle validates with no `new Function` (see main/common/project/validation/validator-source.ts).
 *
 * Workers (renderer/tuning/tuning-worker.ts, `new Worker(new URL(...), { type: 'module' })`) are
 * bundled as ES modules into the same folder, so they load under `worker-src 'self'`.
 */
import { defineConfig } from 'vite';
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';

const here = (p: string): string => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  root: here('./renderer'),
  base: './',
  plugins: [vue()],
  build: {
    outDir: here('./dist/renderer'),
    emptyOutDir: true,
    target: 'es2022',
    chunkSizeWarningLimit: 2500,
    modulePreload: { polyfill: false },
  },
  worker: { format: 'es' },
  server: { port: 5173, strictPort: false },
});
