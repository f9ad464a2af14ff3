import { horizontalNorm, norm } from '../geometry/vector.js';
import type { Leg } from '../network/legs.js';
import type { Project, ProjectNode } from '../model/projectSchema.js';
import type { CaseThrust } from '../thrust/fittingThrust.js';
import { value, type CalcStep, type RecordValue } from './calcRecord.js';

const MOMENTUM =
  'Steady momentum balance on the fitting (linear momentum equation; e.g. White, "Fluid Mechanics", ch. 3)';

/** The calculation record of the governing case's thrust: pressure at the node, then the balance. */
export function thrustSteps(
  project: Project,
  node: ProjectNode,
  legs: readonly Leg[],
  governing: CaseThrust,
): CalcStep[] {
  const loadCase = project.loadCases.find((c) => c.id === governing.caseId)!;
  const steps: CalcStep[] = [];
  const caseName = loadCase.label ?? loadCase.id;
  if (loadCase.datumElevation !== undefined) {
    steps.push({
      title: `Pressure at the fitting, case "${caseName}"`,
      formula: 'p = p_case + ρ·g·(z_datum − z)',
      inputs: [
        value('p_case', 'case pressure at its datum', loadCase.pressure, 'pressure', 'load case'),
        value('z_datum', 'datum elevation', loadCase.datumElevation, 'elevation', 'load case'),
        value('z', 'pipe centreline elevation at the node', node.elevation, 'elevation', 'node'),
        value('ρ', 'water density', project.water.density, 'density', 'project'),
      ],
      result: value('p', 'gauge pressure at the node', governing.pressure, 'pressure', 'computed'),
      reference: 'Hydrostatics, standard gravity g = 9.80665 m/s²',
    });
  }
  const flowing = governing.closedAgainst === null;
  const areaInputs: RecordValue[] = legs.map((l) =>
    value(
      `A(${l.pipe.id})`,
      `thrust area of ${l.pipe.id} (${project.design.thrustArea} diameter)`,
      l.thrustArea,
      'area',
      'pipe',
    ),
  );
  const flowInputs: RecordValue[] = legs.flatMap((l) => [
    value(`a(${l.pipe.id})`, `flow area of ${l.pipe.id}`, l.flowArea, 'area', 'pipe'),
    value(
      `Q(${l.pipe.id})`,
      `outflow along ${l.pipe.id} × flow factor`,
      flowing ? l.outflow * loadCase.flowFactor : 0,
      'flow',
      flowing ? 'pipe × case' : 'valve closed',
    ),
  ]);
  steps.push({
    title: `Static thrust, case "${caseName}"`,
    formula: governing.closedAgainst
      ? `F_s = −p·A·n on the side of ${governing.closedAgainst} (valve closed)`
      : 'F_s = −Σ p·A_i·n_i',
    inputs: [value('p', 'gauge pressure at the node', governing.pressure, 'pressure', 'computed'), ...areaInputs],
    result: value('|F_s|', 'static thrust', norm(governing.static), 'force', 'computed'),
    reference: MOMENTUM,
  });
  steps.push({
    title: 'Dynamic thrust',
    formula: 'F_d = −Σ ρ·Q_i²/a_i·n_i',
    inputs: [value('ρ', 'water density', project.water.density, 'density', 'project'), ...flowInputs],
    result: value('|F_d|', 'dynamic (momentum) thrust', norm(governing.dynamic), 'force', 'computed'),
    reference: MOMENTUM,
  });
  steps.push({
    title: 'Total thrust on the fitting',
    formula: 'F = F_s + F_d',
    inputs: [
      value('F_h', 'horizontal part', horizontalNorm(governing.total), 'force', 'computed'),
      value('F_z', 'vertical part (up +)', governing.total[2], 'force', 'computed'),
    ],
    result: value('|F|', 'total thrust', norm(governing.total), 'force', 'computed'),
    reference: MOMENTUM,
  });
  return steps;
}
