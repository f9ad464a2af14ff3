import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import { offline } from './build/offline.js';

const publicDir = fileURLToPath(new URL('../public', import.meta.url));
const htmlTemplate = fileURLToPath(new URL('./index.html', import.meta.url));

export default defineConfig({
  plugins: [react(), offline(publicDir, htmlTemplate)],
  publicDir,
  base: './',
  build: { target: 'es2022', sourcemap: false },
  test: {
    name: 'app',
    environment: 'happy-dom',
    include: ['src/**/*.test.{ts,tsx}', 'build/**/*.test.ts'],
    setupFiles: ['./src/testSetup.ts'],
  },
});
