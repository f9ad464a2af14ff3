import { circleArea, meters } from '../units/quantities.js';
import type { Vec3 } from '../geometry/vector.js';
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

/**
 * The two legs of one pipe: seen from `a` (its from-node) and from `b` (its to-node).
 * @param useOutside the pressure acts on the outside diameter (design.thrustArea = 'outside')
 */
export function pipeLegs(pipe: Pipe, a: ProjectNode, b: ProjectNode, useOutside: boolean): [Leg, Leg] {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const dz = b.elevation - a.elevation;
  const length = Math.sqrt(dx * dx + dy * dy + dz * dz);
  const thrustArea = circleArea(meters(useOutside ? pipe.outsideDiameter : pipe.insideDiameter));
  const flowArea = circleArea(meters(pipe.insideDiameter));
  const ux = dx / length;
  const uy = dy / length;
  const uz = dz / length;
  return [
    { pipe, far: b, direction: [ux, uy, uz], length, thrustArea, flowArea, outflow: pipe.flow },
    { pipe, far: a, direction: [-ux, -uy, -uz], length, thrustArea, flowArea, outflow: -pipe.flow },
  ];
}

/** Every node's legs, in pipe order. Assumes a validated project (references resolve). */
export function legsByNode(project: Project): Map<string, Leg[]> {
  const nodes = new Map<string, ProjectNode>();
  const legs = new Map<string, Leg[]>();
  for (const n of project.nodes) {
    nodes.set(n.id, n);
    legs.set(n.id, []);
  }
  const useOutside = project.design.thrustArea === 'outside';
  for (const pipe of project.pipes) {
    const a = nodes.get(pipe.from);
    const b = nodes.get(pipe.to);
    if (!a || !b) continue;
    const [fromA, fromB] = pipeLegs(pipe, a, b, useOutside);
    legs.get(a.id)!.push(fromA);
    legs.get(b.id)!.push(fromB);
  }
  return legs;
}
