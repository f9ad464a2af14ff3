// The command line ships as one bundled ES module, so that start-up stays close to bare Node; the
// schema library is a chunk of its own, loaded only to word the problems of a file that is not valid;
// import and export load the CSV and projection libraries from chunks of their own, on demand.
import { defineConfig } from 'rolldown';

export default defineConfig({
  input: { mainbrace: 'src/cli/main.ts' },
  platform: 'node',
  output: {
    dir: 'dist',
    entryFileNames: 'mainbrace.mjs',
    chunkFileNames: '[name]-[hash].mjs',
    format: 'esm',
    minify: true,
  },
});
