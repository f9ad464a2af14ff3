// Benchmarks of the solver and the command line; prints figures, asserts nothing.
// Usage: pnpm bench (from the repo root). Files go to .bench/ (ignored by git).
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { build } from 'rolldown';

const here = fileURLToPath(new URL('.', import.meta.url));
const root = join(here, '../../..');
const out = join(root, '.bench');
mkdirSync(out, { recursive: true });

await build({
  input: join(here, 'solverBench.ts'),
  platform: 'node',
  output: { file: join(out, 'solverBench.mjs'), format: 'esm' },
  logLevel: 'silent',
});
execFileSync(process.execPath, [join(out, 'solverBench.mjs'), out], { stdio: 'inherit' });

function median(cmd, args, repeats = 11) {
  const t = [];
  for (let i = 0; i < repeats; i++) {
    const start = process.hrtime.bigint();
    const r = spawnSync(cmd, args, { stdio: ['ignore', 'ignore', 'inherit'] });
    if (r.status !== 0) throw new Error(`${args.join(' ')} exited ${r.status}`);
    t.push(Number(process.hrtime.bigint() - start) / 1e6);
  }
  return t.sort((a, b) => a - b)[Math.floor(repeats / 2)];
}

const file = join(out, 'route-10000.json');
const bare = median(process.execPath, [
  '-e',
  `JSON.parse(require('fs').readFileSync(${JSON.stringify(file)}, 'utf8'))`,
]);
const cli = median(process.execPath, [
  join(root, 'packages/solver/bin/mainbrace.mjs'),
  'schedule',
  file,
  '--format',
  'json',
]);
const table = median(process.execPath, [join(root, 'packages/solver/bin/mainbrace.mjs'), 'schedule', file]);
const validate = median(process.execPath, [join(root, 'packages/solver/bin/mainbrace.mjs'), 'validate', file]);
console.log(
  `cli     10,000-node file: validate ${validate.toFixed(0)} ms (${(validate / bare).toFixed(2)}×), schedule as a table ${table.toFixed(0)} ms (${(table / bare).toFixed(2)}×)`,
);
console.log(
  `cli     10,000-node file: schedule --format json ${cli.toFixed(0)} ms; bare node read + JSON.parse ${bare.toFixed(0)} ms; ratio ${(cli / bare).toFixed(2)} (goal ≤ 3)`,
);
