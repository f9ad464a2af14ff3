// The command line ships as one bundled ES module: one file to load keeps start-up close to bare Node.
import { defineConfig } from 'rolldown';

export default defineConfig({
  input: 'src/cli/main.ts',
  platform: 'node',
  output: { file: 'dist/mainbrace.mjs', format: 'esm', minify: true },
});
