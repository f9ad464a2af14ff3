// Builds the app in test mode, serves it, runs the browser benchmarks, stops the server; exits 1 when
// a budget is broken. The port is BENCH_PORT (or E2E_PORT), so that benches of several trees can run.
import { spawn, execSync, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { build } from 'rolldown';

const root = fileURLToPath(new URL('../..', import.meta.url));
const port = Number(process.env.BENCH_PORT ?? process.env.E2E_PORT ?? 4174);
if (!process.env.BENCH_NO_BUILD) execSync('pnpm --filter app build --mode test', { cwd: root, stdio: 'ignore' });
const server = spawn(
  'pnpm',
  ['--filter', 'app', 'exec', 'vite', 'preview', '--host', '127.0.0.1', '--port', String(port), '--strictPort'],
  { cwd: root, stdio: 'ignore', detached: true },
);
let status;
try {
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/`)).ok) break;
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
  status =
    spawnSync(process.execPath, [out], {
      cwd: join(root, 'e2e'),
      stdio: 'inherit',
      env: { ...process.env, BENCH_URL: `http://127.0.0.1:${port}/` },
    }).status ?? 1;
} finally {
  process.kill(-server.pid, 'SIGTERM');
}
process.exit(status);
