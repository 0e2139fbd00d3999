/**
 * Build of the renderer (Vue 3 + Pinia + three.js): root renderer/, output dist/renderer/.
 * base './' so the same build loads from file://, the desktop app protocol and the web host.
 * No remote content; the build contains no eval and no inline scripts (CSP: script-src 'self').
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
  server: { port: 5173, strictPort: false },
});
