// The in-process figures, each beside its floor measured in the same run (bench/floor.ts). Writes
// .bench/solver.json for run.mjs, which judges the budgets.
import { writeFileSync } from 'node:fs';
import { parseProject } from '../src/model/parseProject.js';
import { analyseNext, analyseProject } from '../src/analysis/analyse.js';
import { scheduleOf } from '../src/schedule/scheduleOf.js';
import { analyseProject as previousAnalysis } from '../test/oracle/analyseOracle.js';
import { generateRoute } from './generateRoute.js';
import { floorSchedule } from './floor.js';
import { paired, type Paired } from './paired.js';

const out = process.argv[2] ?? '.bench';
const results: Record<string, Paired & { fittings: number }> = {};
let sink = 0;
for (const size of [1000, 10000]) {
  const input = generateRoute(size);
  writeFileSync(`${out}/route-${size}.json`, JSON.stringify(input));
  const parsed = parseProject(input);
  if (!parsed.ok) throw new Error('generated route is invalid');
  const project = parsed.project;
  const fittings = analyseProject(project).fittings.length;
  const floor = () => {
    sink += floorSchedule(project);
  };
  const schedule = () => {
    sink += scheduleOf(analyseProject(project)).fittings.length;
  };
  // A test-pressure change, as the slider makes it: the route and the other cases stay the same objects.
  const before = analyseProject(project);
  let k = 0;
  const pressureChange = () => {
    k++;
    const loadCases = project.loadCases.map((c) => (c.id === 'test' ? { ...c, pressure: c.pressure + k * 1000 } : c));
    sink += analyseNext(before, { ...project, loadCases }).fittings.length;
  };
  const analysis = () => {
    sink += analyseProject(project).fittings.length;
  };
  const previous = () => {
    sink += previousAnalysis(project).fittings.length;
  };
  const pairs = size > 1000 ? 15 : 41;
  for (let i = 0; i < 5; i++) {
    floor();
    schedule();
    pressureChange();
    analysis();
    previous();
  }
  results[`schedule-${size}`] = { fittings, ...paired(schedule, floor, pairs) };
  results[`pressure-${size}`] = { fittings, ...paired(pressureChange, floor, pairs) };
  results[`analysis-${size}`] = { fittings, ...paired(analysis, floor, pairs) };
  results[`previous-${size}`] = { fittings, ...paired(previous, floor, pairs) };
}
writeFileSync(`${out}/solver.json`, JSON.stringify(results, null, 2));
if (Number.isNaN(sink)) console.log('');
