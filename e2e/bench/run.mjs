// Builds the app in test mode, serves it, runs the browser benchmarks, stops the server.
import { spawn, execSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { build } from 'rolldown';

const root = fileURLToPath(new URL('../..', import.meta.url));
execSync('pnpm --filter app build --mode test', { cwd: root, stdio: 'ignore' });
const server = spawn(
  'pnpm',
  ['--filter', 'app', 'exec', 'vite', 'preview', '--host', '127.0.0.1', '--port', '4174', '--strictPort'],
  { cwd: root, stdio: 'ignore', detached: true },
);
try {
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch('http://127.0.0.1:4174/')).ok) break;
    } catch {
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  const out = join(root, 'e2e/.bench/appBench.mjs');
  await build({
    input: join(root, 'e2e/bench/appBench.ts'),
    platform: 'node',
    external: [/^@playwright/, /^playwright/],
    output: { file: out, format: 'esm' },
    logLevel: 'silent',
  });
  execSync(`node ${out}`, { cwd: join(root, 'e2e'), stdio: 'inherit' });
} finally {
  process.kill(-server.pid, 'SIGTERM');
}
