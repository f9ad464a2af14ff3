// The solver's and the command line's speed, each figure beside a floor measured in the same run, as
// medians of paired runs of CPU time; exits 1 when a ratio budget is broken (docs/performance.md).
// Usage: pnpm bench (from the repo root). Files go to .bench/ (ignored by git).
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { build } from 'rolldown';

const here = fileURLToPath(new URL('.', import.meta.url));
const root = join(here, '../../..');
const out = join(root, '.bench');
mkdirSync(out, { recursive: true });

/** Ratio budgets (docs/performance.md): a figure over its floor may not exceed these. */
const BUDGETS = {
  'schedule-10000': 3,
  'cli-json-10000': 3,
};

await build({
  input: join(here, 'solverBench.ts'),
  platform: 'node',
  output: { file: join(out, 'solverBench.mjs'), format: 'esm' },
  logLevel: 'silent',
});
execFileSync(process.execPath, [join(out, 'solverBench.mjs'), out], { stdio: 'inherit' });
const results = JSON.parse(readFileSync(join(out, 'solver.json'), 'utf8'));

const median = (v) => {
  const s = [...v].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

// Each child reports its own CPU time (user + system, all threads) on exit, through file descriptor 3.
const preload = join(out, 'cpu-report.cjs');
writeFileSync(
  preload,
  "process.on('exit', () => { const u = process.cpuUsage(); require('fs').writeSync(3, String((u.user + u.system) / 1000)); });\n",
);

/** Runs node with `args`; its CPU time and wall time, ms. */
function run(args) {
  const start = process.hrtime.bigint();
  const r = spawnSync(process.execPath, ['--require', preload, ...args], {
    stdio: ['ignore', 'ignore', 'inherit', 'pipe'],
  });
  const wall = Number(process.hrtime.bigint() - start) / 1e6;
  if (r.status !== 0) throw new Error(`${args.join(' ')} exited ${r.status}`);
  return { cpu: Number(r.output[3].toString()), wall };
}

/** A command beside its floor, each pair run back to back, alternating which goes first. */
function pairedProcesses(args, floorArgs, pairs = 11) {
  const f = [];
  const b = [];
  const r = [];
  const wf = [];
  const wb = [];
  run(args); // the first start of a file pays the disk cache
  for (let i = 0; i < pairs; i++) {
    let figure;
    let floor;
    if (i % 2) {
      floor = run(floorArgs);
      figure = run(args);
    } else {
      figure = run(args);
      floor = run(floorArgs);
    }
    f.push(figure.cpu);
    b.push(floor.cpu);
    wf.push(figure.wall);
    wb.push(floor.wall);
    r.push(figure.cpu / floor.cpu);
  }
  return { figure: median(f), floor: median(b), ratio: median(r), wallFigure: median(wf), wallFloor: median(wb) };
}

const cli = join(root, 'packages/solver/bin/mainbrace.mjs');
const file = join(out, 'route-10000.json');
const bare = ['-e', `JSON.parse(require('fs').readFileSync(${JSON.stringify(file)}, 'utf8'))`];
results['cli-json-10000'] = { nodes: 10000, ...pairedProcesses([cli, 'schedule', file, '--format', 'json'], bare) };
results['cli-validate-10000'] = { nodes: 10000, ...pairedProcesses([cli, 'validate', file], bare, 7) };
results['cli-table-10000'] = { nodes: 10000, ...pairedProcesses([cli, 'schedule', file], bare, 7) };

const LABEL = {
  'analysis-1000': 'analysis, 1,000 fittings',
  'analysis-10000': 'analysis, 10,000 fittings',
  'schedule-1000': 'schedule (analysis + rows), 1,000 fittings',
  'schedule-10000': 'schedule (analysis + rows), 10,000 fittings',
  'pressure-1000': 'test-pressure change (analyseNext), 1,000 fittings',
  'pressure-10000': 'test-pressure change (analyseNext), 10,000 fittings',
  'previous-1000': 'previous analysis (object per state), 1,000 fittings',
  'previous-10000': 'previous analysis (object per state), 10,000 fittings',
  'cli-json-10000': 'CLI schedule --format json, 10,000-node file',
  'cli-validate-10000': 'CLI validate, 10,000-node file',
  'cli-table-10000': 'CLI schedule (table), 10,000-node file',
};
const ms = (v) => (v < 10 ? v.toFixed(2) : v.toFixed(0));
let broken = 0;
console.log('CPU time (user + system), medians of paired runs; wall-clock medians in brackets');
console.log('figure'.padEnd(56), 'figure ms'.padStart(18), 'floor ms'.padStart(16), 'ratio'.padStart(8), '  budget');
for (const [key, r] of Object.entries(results)) {
  const floorName = key.startsWith('cli-') ? 'read + JSON.parse' : 'typed-array floor';
  const budget = BUDGETS[key];
  const ok = budget === undefined || r.ratio <= budget;
  if (!ok) broken++;
  console.log(
    (LABEL[key] ?? key).padEnd(56),
    `${ms(r.figure)} (${ms(r.wallFigure)})`.padStart(18),
    `${ms(r.floor)} (${ms(r.wallFloor)})`.padStart(16),
    `${r.ratio.toFixed(2)}×`.padStart(8),
    budget === undefined ? `  (floor: ${floorName})` : `  ≤ ${budget}× ${ok ? 'ok' : 'BROKEN'} (floor: ${floorName})`,
  );
}
if (broken) {
  console.error(`${broken} ratio budget${broken > 1 ? 's' : ''} broken`);
  // Known broken budgets (docs/performance.md) are reported, and fail the run only when asked: CI
  // lands work while the speed issue is open; BENCH_ENFORCE=1 (`pnpm bench:strict`) makes them fail.
  if (process.env.BENCH_ENFORCE === '1') process.exitCode = 1;
}
