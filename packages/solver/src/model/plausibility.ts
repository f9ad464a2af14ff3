import type { Diagnostic, DiagnosticCode, Subject } from '../diagnostics/diagnostic.js';
import { diagnostic } from '../diagnostics/diagnostic.js';
import { LIMITS, unusual, type Limit, type LimitId } from './limits.js';
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

/**
 * Values inside the hard limits but outside the usual ones (model/limits.ts): each a warning naming the
 * field, since such a value is more often a unit slip than a design. Velocity is |Q·flow factor|/a,
 * the largest over the cases.
 */
export function implausibleInputs(p: Project): Diagnostic[] {
  const out: Diagnostic[] = [];
  // The subject is made only for a value out of range: every node and pipe is checked on every analysis.
  const check = (id: LimitId, v: number, subject: () => Subject) => {
    const l: Limit = LIMITS[id];
    const code = CODE[id];
    if (code && l.usual && unusual(l, v))
      out.push(diagnostic(code, subject(), { value: v, low: l.usual.min, high: l.usual.max }));
  };
  check('density', p.water.density, () => ({ field: 'water.density' }));
  const d = p.design;
  check('concreteUnitWeight', d.concreteUnitWeight, () => ({ field: 'design.concreteUnitWeight' }));
  check('blockDepth', d.blockDepth, () => ({ field: 'design.blockDepth' }));
  if (d.trenchWidth !== null) check('trenchWidth', d.trenchWidth, () => ({ field: 'design.trenchWidth' }));
  for (const k of ['bearingSafetyFactor', 'upliftSafetyFactor', 'restraintSafetyFactor'] as const)
    check('safetyFactor', d[k], () => ({ field: `design.${k}` }));
  p.loadCases.forEach((c, i) =>
    check('pressure', c.pressure, () => ({ case: c.id, field: `loadCases[${i}].pressure` })),
  );
  p.soils.forEach((s, i) => {
    const at = (f: string) => () => ({ soil: s.id, field: `soils[${i}].${f}` });
    check('bearing', s.bearing, at('bearing'));
    check('soilUnitWeight', s.unitWeight, at('unitWeight'));
    check('frictionAngle', s.frictionAngle, at('frictionAngle'));
    check('cohesion', s.cohesion, at('cohesion'));
  });
  const od = nodeOutsideDiameters(p);
  p.nodes.forEach((n, i) =>
    check('cover', nodeCover(n, od.get(n.id) ?? 0), () => ({
      node: n.id,
      field: `nodes[${i}].${n.groundLevel === undefined ? 'cover' : 'groundLevel'}`,
    })),
  );
  // Groundwater above the ground everywhere: no usual range fits every site, but above the whole
  // route it is more often an elevation typed in another unit or datum than a flooded site.
  if (d.groundwaterElevation !== null && p.nodes.length > 0) {
    let highestGround = -Infinity;
    for (const n of p.nodes) highestGround = Math.max(highestGround, nodeGround(n, od.get(n.id) ?? 0));
    if (d.groundwaterElevation > highestGround)
      out.push(
        diagnostic(
          'input.groundwater-above-ground',
          { field: 'design.groundwaterElevation' },
          { groundwater: d.groundwaterElevation, highestGround },
        ),
      );
  }
  // a loop, not Math.max(...cases): spread into a call, some 125,000 cases overflow the stack
  let factor = 0;
  for (const c of p.loadCases) factor = Math.max(factor, Math.abs(c.flowFactor));
  p.pipes.forEach((pipe, i) => {
    check('outsideDiameter', pipe.outsideDiameter, () => ({ pipe: pipe.id, field: `pipes[${i}].outsideDiameter` }));
    const velocity = (Math.abs(pipe.flow) * factor) / ((Math.PI * pipe.insideDiameter ** 2) / 4);
    check('velocity', velocity, () => ({ pipe: pipe.id, field: `pipes[${i}].flow` }));
  });
  return out;
}
