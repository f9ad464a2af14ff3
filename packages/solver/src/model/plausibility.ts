import type { Diagnostic, DiagnosticCode, Subject } from '../diagnostics/diagnostic.js';
import { diagnostic } from '../diagnostics/diagnostic.js';
import { LIMITS, unusual, type LimitId } from './limits.js';
import type { Project } from './projectSchema.js';
import { nodeCover, nodeGround, nodeOutsideDiameters } from './groundLevel.js';

const CODE: Partial<Record<LimitId, DiagnosticCode>> = {
  pressure: 'input.pressure-unusual',
  cover: 'input.cover-unusual',
  velocity: 'input.velocity-unusual',
  outsideDiameter: 'input.diameter-unusual',
  density: 'input.density-unusual',
  concreteUnitWeight: 'input.unit-weight-unusual',
  soilUnitWeight: 'input.unit-weight-unusual',
  blockDepth: 'input.length-unusual',
  trenchWidth: 'input.length-unusual',
  bearing: 'input.stress-unusual',
  cohesion: 'input.stress-unusual',
  frictionAngle: 'input.angle-unusual',
  safetyFactor: 'input.factor-unusual',
};

/** Each soil's checked fields, in the order their warnings are listed: limit, field. */
const SOIL_CHECKS = [
  ['bearing', 'bearing'],
  ['soilUnitWeight', 'unitWeight'],
  ['frictionAngle', 'frictionAngle'],
  ['cohesion', 'cohesion'],
] as const;

/** Whether `v` is outside the usual range of limit `id` (and that limit has a warning code). */
function isUnusual(id: LimitId, v: number): boolean {
  const l = LIMITS[id];
  return CODE[id] !== undefined && l.usual !== undefined && unusual(l, v);
}

/** The warning for `v` outside the usual range of limit `id`; only called when `isUnusual` said so. */
function flagged(id: LimitId, v: number, subject: Subject): Diagnostic {
  const usual = LIMITS[id].usual!;
  return diagnostic(CODE[id]!, subject, { value: v, low: usual.min, high: usual.max });
}

/**
 * m, the largest outside diameter meeting at node i (as `nodeOutsideDiameters` gives it), in a typed
 * array by node index, or null when two nodes share an id (then only that map answers alike for both).
 * Every node and pipe is checked on every analysis: the map of ids cost more than the checks.
 */
function outsideDiametersByIndex(p: Project, index?: ReadonlyMap<string, number>): Float64Array | null {
  const nodes = p.nodes;
  let at = index;
  if (!at) {
    const made = new Map<string, number>();
    for (let i = 0; i < nodes.length; i++) made.set(nodes[i]!.id, i);
    at = made;
  }
  if (at.size !== nodes.length) return null;
  const od = new Float64Array(nodes.length);
  for (const pipe of p.pipes) {
    const a = at.get(pipe.from);
    if (a !== undefined) od[a] = Math.max(od[a]!, pipe.outsideDiameter);
    const b = at.get(pipe.to);
    if (b !== undefined) od[b] = Math.max(od[b]!, pipe.outsideDiameter);
  }
  return od;
}

/** What the check of a route's nodes found, kept for the next check of the same route (`implausibleInputs`). */
export interface PlausibilityKept {
  route?: { nodes: Project['nodes']; pipes: Project['pipes']; design: Project['design']; found: Diagnostic[] };
}

/** Unusual cover at each node, and groundwater above the whole route: they read nodes, pipes and design only. */
function routeFindings(p: Project, index: ReadonlyMap<string, number> | undefined): Diagnostic[] {
  const found: Diagnostic[] = [];
  const d = p.design;
  const nodes = p.nodes;
  const byIndex = outsideDiametersByIndex(p, index);
  const byId = byIndex ? null : nodeOutsideDiameters(p);
  const odAt = (i: number): number => (byIndex ? byIndex[i]! : (byId!.get(nodes[i]!.id) ?? 0));
  for (let i = 0; i < nodes.length; i++) {
    const n = nodes[i]!;
    const cover = nodeCover(n, odAt(i));
    if (isUnusual('cover', cover))
      found.push(
        flagged('cover', cover, {
          node: n.id,
          field: `nodes[${i}].${n.groundLevel === undefined ? 'cover' : 'groundLevel'}`,
        }),
      );
  }
  // Groundwater above the ground everywhere: no usual range fits every site, but above the whole
  // route it is more often an elevation typed in another unit or datum than a flooded site.
  // Above the ground at some nodes only, it may be a flooded stretch or a slip: either way those
  // fittings are sized submerged, which the designer should know.
  if (d.groundwaterElevation !== null && nodes.length > 0) {
    let highestGround = -Infinity;
    let lowestGround = Infinity;
    let flooded = 0;
    for (let i = 0; i < nodes.length; i++) {
      const ground = nodeGround(nodes[i]!, odAt(i));
      highestGround = Math.max(highestGround, ground);
      lowestGround = Math.min(lowestGround, ground);
      if (d.groundwaterElevation > ground) flooded++;
    }
    const groundwater = d.groundwaterElevation;
    const field = { field: 'design.groundwaterElevation' };
    if (groundwater > highestGround)
      found.push(diagnostic('input.groundwater-above-ground', field, { groundwater, highestGround }));
    else if (flooded > 0)
      found.push(diagnostic('input.groundwater-above-some-ground', field, { groundwater, lowestGround, flooded }));
  }
  return found;
}

/**
 * Values inside the hard limits but outside the usual ones (model/limits.ts): each a warning naming the
 * field, since such a value is more often a unit slip than a design. Velocity is |Q·flow factor|/a,
 * the largest over the cases. `index` (node index by id, as the route graph holds it) saves making one.
 * `kept`, held by the caller for one route, keeps the findings about the nodes for the next check of
 * the same nodes, pipes and design (a load-case edit checks the cases and the pipes' velocities only).
 */
export function implausibleInputs(
  p: Project,
  index?: ReadonlyMap<string, number>,
  kept?: PlausibilityKept,
): Diagnostic[] {
  const out: Diagnostic[] = [];
  // Plain loops: the subject is made only for a value out of range, and no closure per node or pipe.
  if (isUnusual('density', p.water.density)) out.push(flagged('density', p.water.density, { field: 'water.density' }));
  const d = p.design;
  if (isUnusual('concreteUnitWeight', d.concreteUnitWeight))
    out.push(flagged('concreteUnitWeight', d.concreteUnitWeight, { field: 'design.concreteUnitWeight' }));
  if (isUnusual('blockDepth', d.blockDepth))
    out.push(flagged('blockDepth', d.blockDepth, { field: 'design.blockDepth' }));
  if (d.trenchWidth !== null && isUnusual('trenchWidth', d.trenchWidth))
    out.push(flagged('trenchWidth', d.trenchWidth, { field: 'design.trenchWidth' }));
  for (const k of ['bearingSafetyFactor', 'upliftSafetyFactor', 'restraintSafetyFactor'] as const)
    if (isUnusual('safetyFactor', d[k])) out.push(flagged('safetyFactor', d[k], { field: `design.${k}` }));
  const cases = p.loadCases;
  for (let i = 0; i < cases.length; i++) {
    const c = cases[i]!;
    if (isUnusual('pressure', c.pressure))
      out.push(flagged('pressure', c.pressure, { case: c.id, field: `loadCases[${i}].pressure` }));
  }
  for (let i = 0; i < p.soils.length; i++) {
    const s = p.soils[i]!;
    for (const [id, f] of SOIL_CHECKS)
      if (isUnusual(id, s[f])) out.push(flagged(id, s[f], { soil: s.id, field: `soils[${i}].${f}` }));
  }
  const route = kept
    ? kept.route && kept.route.nodes === p.nodes && kept.route.pipes === p.pipes && kept.route.design === d
      ? kept.route.found
      : (kept.route = { nodes: p.nodes, pipes: p.pipes, design: d, found: routeFindings(p, index) }).found
    : routeFindings(p, index);
  for (let i = 0; i < route.length; i++) out.push(route[i]!);
  // a loop, not Math.max(...cases): spread into a call, some 125,000 cases overflow the stack
  let factor = 0;
  for (const c of cases) factor = Math.max(factor, Math.abs(c.flowFactor));
  const pipes = p.pipes;
  for (let i = 0; i < pipes.length; i++) {
    const pipe = pipes[i]!;
    if (isUnusual('outsideDiameter', pipe.outsideDiameter))
      out.push(
        flagged('outsideDiameter', pipe.outsideDiameter, { pipe: pipe.id, field: `pipes[${i}].outsideDiameter` }),
      );
    const velocity = (Math.abs(pipe.flow) * factor) / ((Math.PI * pipe.insideDiameter ** 2) / 4);
    if (isUnusual('velocity', velocity))
      out.push(flagged('velocity', velocity, { pipe: pipe.id, field: `pipes[${i}].flow` }));
  }
  return out;
}
