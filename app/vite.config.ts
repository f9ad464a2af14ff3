import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import { offline } from './build/offline.js';
import { noPreloadHelper } from './build/noPreloadHelper.js';

const publicDir = fileURLToPath(new URL('../public', import.meta.url));
const htmlTemplate = fileURLToPath(new URL('./index.html', import.meta.url));
const konvaCore = fileURLToPath(new URL('./src/plan/konvaCore.ts', import.meta.url));

export default defineConfig({
  plugins: [react(), offline(publicDir, htmlTemplate), noPreloadHelper()],
  publicDir,
  base: './',
  // Konva's core without the parts the plan never uses (src/plan/konvaCore.ts).
  resolve: { alias: [{ find: /^konva\/lib\/Core(\.js)?$/, replacement: konvaCore }] },
  build: {
    target: 'es2022',
    sourcemap: false,
    // No module-preload polyfill and no preload links (docs/performance.md): a lazy part's own imports are
    // fetched by the browser as it reads the part, and the warm-up after the first draw has them in cache
    // before they are used. Every browser the app runs in (ES2022, module workers) has modules. Vite's
    // preload helper itself goes by build/noPreloadHelper.ts.
    modulePreload: false,
    rolldownOptions: {
      output: {
        // What the first screen needs in one file: shared pieces split out for the lazy parts would
        // each be a request of its own and compress apart (docs/performance.md: 6 kB gzipped more).
        // The findings' words load beside the first document, before the first render: one request.
        codeSplitting: {
          groups: [
            { name: 'start', tags: ['$initial'] },
            { name: 'findingWords', test: /solver[\\/]src[\\/]diagnostics[\\/](codeMeanings|wording)\.ts$/ },
          ],
        },
      },
    },
  },
  test: {
    name: 'app',
    environment: 'happy-dom',
    include: ['src/**/*.test.{ts,tsx}', 'build/**/*.test.ts'],
    setupFiles: ['./src/testSetup.ts'],
  },
});
