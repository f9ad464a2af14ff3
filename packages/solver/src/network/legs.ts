import { sub, unit, norm, type Vec3 } from '../geometry/vector.js';
import { circleArea, meters } from '../units/quantities.js';
import type { Pipe, Project, ProjectNode } from '../model/projectSchema.js';

/** One pipe end at a node, seen from the node. */
export interface Leg {
  pipe: Pipe;
  /** the node at the far end of the pipe */
  far: ProjectNode;
  /** unit vector from the node along the pipe (n_i of the momentum balance) */
  direction: Vec3;
  /** m, pipe length node to node, 3-D */
  length: number;
  /** m², area the static pressure acts on (OD or ID per design.thrustArea) */
  thrustArea: number;
  /** m², inside (flow) area */
  flowArea: number;
  /** m³/s at flowFactor 1, positive when water leaves the node along this pipe */
  outflow: number;
}

const position = (n: ProjectNode): Vec3 => [n.x, n.y, n.elevation];

/** Every node's legs, in pipe order. Assumes a validated project (references resolve). */
export function legsByNode(project: Project): Map<string, Leg[]> {
  const nodes = new Map(project.nodes.map((n) => [n.id, n]));
  const legs = new Map<string, Leg[]>(project.nodes.map((n) => [n.id, []]));
  const useOutside = project.design.thrustArea === 'outside';
  for (const pipe of project.pipes) {
    const a = nodes.get(pipe.from);
    const b = nodes.get(pipe.to);
    if (!a || !b) continue;
    const span = sub(position(b), position(a));
    const length = norm(span);
    const along = unit(span);
    const thrustArea = circleArea(meters(useOutside ? pipe.outsideDiameter : pipe.insideDiameter));
    const flowArea = circleArea(meters(pipe.insideDiameter));
    legs.get(a.id)?.push({ pipe, far: b, direction: along, length, thrustArea, flowArea, outflow: pipe.flow });
    legs.get(b.id)?.push({
      pipe,
      far: a,
      direction: [-along[0], -along[1], -along[2]],
      length,
      thrustArea,
      flowArea,
      outflow: -pipe.flow,
    });
  }
  return legs;
}
