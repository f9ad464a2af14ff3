// The command line ships as a bundled ES module: one file to load keeps start-up close to bare Node.
// Import and export load the CSV and projection libraries from a chunk of their own, on demand.
import { defineConfig } from 'rolldown';

export default defineConfig({
  input: { mainbrace: 'src/cli/main.ts' },
  platform: 'node',
  output: {
    dir: 'dist',
    format: 'esm',
    minify: true,
    entryFileNames: '[name].mjs',
    chunkFileNames: '[name]-[hash].mjs',
  },
});
