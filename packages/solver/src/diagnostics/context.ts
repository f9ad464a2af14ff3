import type { Analysis } from '../analysis/analyse.js';
import { planBearing } from '../geometry/vector.js';
import type { UnitSystem } from '../units/conversions.js';
import type { Project } from '../model/projectSchema.js';
import { compassPoint } from '../schedule/fittingNames.js';
import { formatSi } from '../units/format.js';
import type { WordingContext } from './wording.js';

/**
 * The mark of the next fitting along a pipe from a node, walking on through straight joints: what a
 * crew reads as "toward A6". Null when the line ends at no marked node.
 */
export function legTarget(a: Analysis, node: string, pipe: string): string | null {
  let at = node;
  let via = pipe;
  for (let guard = 0; guard < a.project.pipes.length + 1; guard++) {
    const leg = a.legs.get(at)?.find((l) => l.pipe.id === via);
    if (!leg) return null;
    const far = leg.far.id;
    const mark = a.marks.get(far);
    if (mark !== undefined) return mark;
    const onward = a.legs.get(far)?.find((l) => l.pipe.id !== via);
    if (!onward || (a.legs.get(far)?.length ?? 0) !== 2) return null;
    at = far;
    via = onward.pipe.id;
  }
  return null;
}

/** Words a leg as a crew reads it: "the leg toward A6", or by its compass direction. */
export function legName(a: Analysis, node: string | undefined, pipe: string): string {
  if (node === undefined) return 'the pipe';
  const target = legTarget(a, node, pipe);
  if (target) return `the leg toward ${target}`;
  const leg = a.legs.get(node)?.find((l) => l.pipe.id === pipe);
  return leg ? `the leg running ${compassPoint(planBearing(leg.direction))}` : 'the pipe';
}

interface ById {
  nodes: Map<string, Project['nodes'][number]>;
  pipes: Map<string, Project['pipes'][number]>;
}

const byIdOf = new WeakMap<Project, ById>();

/** The project's nodes and pipes by id, made once per document: wording a list of findings or pipes
 * looked each one up by a search of the whole route (quadratic on a long one). */
function byId(project: Project): ById {
  let b = byIdOf.get(project);
  if (!b) {
    b = { nodes: new Map(project.nodes.map((n) => [n.id, n])), pipes: new Map(project.pipes.map((p) => [p.id, p])) };
    byIdOf.set(project, b);
  }
  return b;
}

/** A node by its mark, else its label, else where it stands ("the point at 120 m E, 35.0 m N"). */
export function nodeName(a: Analysis, id: string, units: UnitSystem): string {
  const mark = a.marks.get(id);
  if (mark) return mark;
  const n = byId(a.project).nodes.get(id);
  if (!n) return 'a point';
  if (n.label) return `“${n.label}”`;
  return `the point at ${formatSi(n.x, 'length', units, 4)} E, ${formatSi(n.y, 'length', units, 4)} N`;
}

/** How diagnostics of this analysis are worded in the given units. */
export function wordingContext(a: Analysis, units: UnitSystem): WordingContext {
  const { project } = a;
  return {
    units,
    caseName: (id) => project.loadCases.find((c) => c.id === id)?.label ?? id,
    soilName: (id) => {
      const s = project.soils.find((x) => x.id === id);
      return s?.label ?? id;
    },
    legName: (node, pipe) => legName(a, node, pipe),
    nodeName: (id) => nodeName(a, id, units),
    pipeName: (id) => {
      const pipe = byId(project).pipes.get(id);
      return pipe ? `the pipe from ${nodeName(a, pipe.from, units)} to ${nodeName(a, pipe.to, units)}` : 'a pipe';
    },
    material: (pipe) => MATERIAL_NAME[byId(project).pipes.get(pipe)?.material ?? 'other'] ?? 'other',
  };
}

const MATERIAL_NAME: Record<string, string> = {
  'ductile-iron': 'ductile iron',
  pvc: 'PVC',
  hdpe: 'HDPE',
  steel: 'steel',
  other: 'of another material',
};
