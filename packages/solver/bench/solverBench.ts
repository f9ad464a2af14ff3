import { writeFileSync } from 'node:fs';
import { parseProject } from '../src/model/parseProject.js';
import { analyseProject } from '../src/analysis/analyse.js';
import { scheduleOf } from '../src/schedule/scheduleRows.js';
import { generateRoute } from './generateRoute.js';

/** Median and minimum of repeated timings, ms. */
function time(run: () => void, repeats: number): { median: number; min: number } {
  const t: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    run();
    t.push(performance.now() - start);
  }
  t.sort((a, b) => a - b);
  return { median: t[Math.floor(t.length / 2)]!, min: t[0]! };
}

const out = process.argv[2] ?? '.bench';
for (const size of [1000, 10000]) {
  const input = generateRoute(size);
  writeFileSync(`${out}/route-${size}.json`, JSON.stringify(input));
  const parsed = parseProject(input);
  if (!parsed.ok) throw new Error('generated route is invalid');
  const project = parsed.project;
  const fittings = analyseProject(project).fittings.length;
  for (let i = 0; i < 20; i++) scheduleOf(analyseProject(project)); // warm up the JIT
  const solve = time(() => scheduleOf(analyseProject(project)), 40);
  const parse = time(() => parseProject(input), 10);
  console.log(
    `solver  ${String(fittings).padStart(6)} fittings × 3 cases: schedule ${solve.median.toFixed(2)} ms median (${solve.min.toFixed(2)} min); parse+validate ${parse.median.toFixed(1)} ms`,
  );
}
