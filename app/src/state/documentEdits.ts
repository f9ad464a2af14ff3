import {
  FOOT,
  MIN_PIPE_LENGTH,
  type Material,
  type UnitSystem,
  type Pipe,
  type Project,
  type ProjectNode,
  geometryProblems,
} from '@mainbrace/solver';

/** A point on the plan, m: x east, y north. */
export interface PlanPoint {
  x: number;
  y: number;
}

/** The pipe a new run is drawn with. */
export interface PipeSpec {
  outsideDiameter: number;
  insideDiameter: number;
  material: Material;
  series?: string;
  nominal?: string;
}

/** Where a drawn run starts or ends: an existing node, a point on a pipe (split there), or open ground. */
export type RouteEnd =
  { kind: 'node'; id: string } | { kind: 'pipe'; id: string; at: PlanPoint } | { kind: 'point'; at: PlanPoint };

/** The next free id with a prefix: n1, n2, ... after the largest number in use. */
export function nextId(prefix: string, used: Iterable<string>): string {
  let max = 0;
  const pattern = new RegExp(`^${prefix}(\\d+)$`);
  for (const id of used) {
    const m = pattern.exec(id);
    if (m) max = Math.max(max, Number(m[1]));
  }
  return `${prefix}${max + 1}`;
}

const round = (v: number) => Math.round(v * 1000) / 1000;

/**
 * Splits a pipe at the point of it nearest to `at`: the pipe keeps its start, a new pipe with the
 * same properties runs on from the new node. Elevation and cover are interpolated along the pipe.
 */
export function splitPipe(project: Project, pipeId: string, at: PlanPoint): { project: Project; nodeId: string } {
  const pipe = project.pipes.find((p) => p.id === pipeId);
  if (!pipe) throw new Error(`no pipe ${pipeId}`);
  const a = project.nodes.find((n) => n.id === pipe.from)!;
  const b = project.nodes.find((n) => n.id === pipe.to)!;
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = Math.min(0.98, Math.max(0.02, ((at.x - a.x) * dx + (at.y - a.y) * dy) / (dx * dx + dy * dy || 1)));
  const nodeId = nextId(
    'n',
    project.nodes.map((n) => n.id),
  );
  const node: ProjectNode = {
    id: nodeId,
    x: round(a.x + t * dx),
    y: round(a.y + t * dy),
    elevation: round(a.elevation + t * (b.elevation - a.elevation)),
    cover: round(a.cover + t * (b.cover - a.cover)),
    // The ground between two surveyed levels is taken as straight (the pipe is interpolated the same way).
    ...(a.groundLevel !== undefined && b.groundLevel !== undefined
      ? { groundLevel: round(a.groundLevel + t * (b.groundLevel - a.groundLevel)) }
      : {}),
    end: 'cap',
    valve: false,
    restraint: 'block',
    ...(a.soil !== undefined ? { soil: a.soil } : {}),
  };
  const { label: _label, ...rest } = pipe;
  const second: Pipe = {
    ...rest,
    id: nextId(
      'p',
      project.pipes.map((p) => p.id),
    ),
    from: nodeId,
    to: pipe.to,
  };
  return {
    nodeId,
    project: {
      ...project,
      nodes: [...project.nodes, node],
      pipes: [...project.pipes.map((p) => (p.id === pipeId ? { ...p, to: nodeId } : p)), second],
    },
  };
}

/**
 * A new node's level and cover where no neighbour gives them, as round figures in the project's units:
 * 100 m and 1.2 m, or 330 ft and 4 ft. A new project's cases are stated at that level (blankProject.ts).
 */
export const FIRST_NODE = {
  si: { elevation: 100, cover: 1.2 },
  us: { elevation: 330 * FOOT, cover: 4 * FOOT },
} as const;

/** A new node at a point, inheriting elevation, cover and soil from a neighbour where there is one. */
function freeNode(id: string, at: PlanPoint, like: ProjectNode | undefined, units: UnitSystem): ProjectNode {
  return {
    id,
    x: round(at.x),
    y: round(at.y),
    elevation: like?.elevation ?? FIRST_NODE[units].elevation,
    cover: like?.cover ?? FIRST_NODE[units].cover,
    end: 'cap',
    valve: false,
    restraint: 'block',
    ...(like?.soil !== undefined ? { soil: like.soil } : {}),
  };
}

function resolveEnd(
  project: Project,
  end: RouteEnd,
  like: ProjectNode | undefined,
): { project: Project; nodeId: string } {
  if (end.kind === 'node') return { project, nodeId: end.id };
  if (end.kind === 'pipe') return splitPipe(project, end.id, end.at);
  const id = nextId(
    'n',
    project.nodes.map((n) => n.id),
  );
  return { project: { ...project, nodes: [...project.nodes, freeNode(id, end.at, like, project.units)] }, nodeId: id };
}

/**
 * A run that starts and ends on the same pipe: the start split it, so an end beyond the split point
 * lies on the new second piece (the one leaving the split node), not on the pipe's first piece.
 */
function pieceOfSplit(before: Project, after: Project, start: RouteEnd, end: RouteEnd, splitNode: string): RouteEnd {
  if (start.kind !== 'pipe' || end.kind !== 'pipe' || end.id !== start.id) return end;
  const pipe = before.pipes.find((p) => p.id === start.id)!;
  const a = before.nodes.find((n) => n.id === pipe.from)!;
  const b = before.nodes.find((n) => n.id === pipe.to)!;
  const along = (q: PlanPoint) => (q.x - a.x) * (b.x - a.x) + (q.y - a.y) * (b.y - a.y);
  if (along(end.at) <= along(start.at)) return end;
  return { ...end, id: after.pipes.find((p) => p.from === splitNode)!.id };
}

/**
 * Adds a drawn run: from its start (a node, a split pipe or a new point) through the vertices to its
 * end, one pipe per segment, all with the same pipe spec. A start on a node makes a branch there.
 */
/**
 * An edit whose result the project format would refuse — nodes on one point, pipes on top of each
 * other — changes nothing (the document stays as it was).
 */
function keepGeometry(before: Project, after: Project): Project {
  if (after === before || geometryProblems(after).length === 0) return after;
  return geometryProblems(before).length > 0 ? after : before;
}

export function addRoute(
  project: Project,
  start: RouteEnd,
  vertices: readonly PlanPoint[],
  end: RouteEnd | null,
  spec: PipeSpec,
): Project {
  let doc = project;
  const first = resolveEnd(doc, start, undefined);
  doc = first.project;
  let previous = doc.nodes.find((n) => n.id === first.nodeId)!;
  const last = end && pieceOfSplit(project, doc, start, end, first.nodeId);
  const stops: RouteEnd[] = [...vertices.map((at) => ({ kind: 'point', at }) as RouteEnd), ...(last ? [last] : [])];
  for (const stop of stops) {
    const next = resolveEnd(doc, stop, previous);
    const to = next.project.nodes.find((n) => n.id === next.nodeId)!;
    // A stop on the previous point adds no pipe, so it must add no node either (it would be left bare).
    if (to.id === previous.id || Math.hypot(to.x - previous.x, to.y - previous.y) < 0.01) continue;
    doc = next.project;
    const pipe: Pipe = {
      id: nextId(
        'p',
        doc.pipes.map((p) => p.id),
      ),
      from: previous.id,
      to: to.id,
      outsideDiameter: spec.outsideDiameter,
      insideDiameter: spec.insideDiameter,
      flow: 0,
      material: spec.material,
      ...(spec.series !== undefined ? { series: spec.series } : {}),
      ...(spec.nominal !== undefined ? { nominal: spec.nominal } : {}),
    };
    doc = { ...doc, pipes: [...doc.pipes, pipe] };
    previous = to;
  }
  return keepGeometry(project, doc);
}

/**
 * Moves nodes to new plan positions (m); pipes follow because they refer to the nodes. A move that
 * would put a pipe's two nodes on one point is refused (the document is returned unchanged).
 */
export function moveNodes(project: Project, moves: ReadonlyMap<string, PlanPoint>): Project {
  const nodes = project.nodes.map((n) =>
    moves.has(n.id) ? { ...n, x: round(moves.get(n.id)!.x), y: round(moves.get(n.id)!.y) } : n,
  );
  const byId = new Map(nodes.map((n) => [n.id, n]));
  const collapses = project.pipes.some((p) => {
    const a = byId.get(p.from),
      b = byId.get(p.to);
    const moved = moves.has(p.from) || moves.has(p.to);
    return moved && a && b && Math.hypot(a.x - b.x, a.y - b.y, a.elevation - b.elevation) < MIN_PIPE_LENGTH;
  });
  return collapses ? project : keepGeometry(project, { ...project, nodes });
}

/**
 * A bend or joint (two pipes of one size and material) deleted on its own: its two pipes become one
 * straight pipe between the neighbours, as a designer taking a bend out of a route means. Returns the
 * project unchanged when the node is not such a joint.
 */
function joinAcross(
  project: Project,
  nodeId: string,
  nodeIds: ReadonlySet<string>,
  pipeIds: ReadonlySet<string>,
): Project {
  const meeting = project.pipes.filter((p) => p.from === nodeId || p.to === nodeId);
  if (meeting.length !== 2) return project;
  const [a, b] = meeting as [Pipe, Pipe];
  const farA = a.from === nodeId ? a.to : a.from;
  const farB = b.from === nodeId ? b.to : b.from;
  const same =
    a.outsideDiameter === b.outsideDiameter && a.insideDiameter === b.insideDiameter && a.material === b.material;
  if (!same || farA === farB || pipeIds.has(a.id) || pipeIds.has(b.id) || nodeIds.has(farA) || nodeIds.has(farB))
    return project;
  // The joined pipe runs farA → farB and carries pipe a's flow in that sense.
  const flow = a.to === nodeId ? a.flow : -a.flow;
  const joined: Pipe = { ...a, from: farA, to: farB, flow };
  return {
    ...project,
    nodes: project.nodes.filter((n) => n.id !== nodeId),
    pipes: project.pipes.filter((p) => p.id !== b.id).map((p) => (p.id === a.id ? joined : p)),
  };
}

/**
 * Deletes pipes, and nodes with every pipe that meets them; nodes left with no pipe go too. A bend or
 * joint deleted on its own is taken out of the line instead: its neighbours are joined by one pipe.
 */
export function deleteItems(project: Project, nodeIds: ReadonlySet<string>, pipeIds: ReadonlySet<string>): Project {
  let doc = project;
  const remaining = new Set(nodeIds);
  for (const id of nodeIds) {
    const joined = joinAcross(doc, id, nodeIds, pipeIds);
    if (joined !== doc) {
      doc = joined;
      remaining.delete(id);
    }
  }
  const pipes = doc.pipes.filter((p) => !pipeIds.has(p.id) && !remaining.has(p.from) && !remaining.has(p.to));
  const touched = new Set<string>();
  for (const p of doc.pipes) if (!pipes.includes(p)) [p.from, p.to].forEach((id) => touched.add(id));
  const stillUsed = new Set(pipes.flatMap((p) => [p.from, p.to]));
  const nodes = doc.nodes.filter((n) => !remaining.has(n.id) && !(touched.has(n.id) && !stillUsed.has(n.id)));
  return keepGeometry(project, { ...doc, nodes, pipes });
}
