import {
  horizontalNorm,
  norm,
  restrainedJointCount,
  restrainedJointPositions,
  type Leg,
  type Analysis,
  type FittingKind,
  type Material,
  type Pipe,
  type Project,
  type ProjectNode,
  type Vec3,
} from '@mainbrace/solver';
import type { PlanPoint } from '../state/documentEdits.js';
import type { CaseView, Selection } from '../state/store.js';
import { keptPer } from '../state/keptPer.js';

export interface ScenePipe {
  id: string;
  a: PlanPoint;
  b: PlanPoint;
  outsideDiameter: number;
  material: Material;
  selected: boolean;
}

export interface SceneFitting {
  node: string;
  /** run letter and number along the run: A1, A2 … B1 */
  mark: string;
  kind: FittingKind;
  at: PlanPoint;
  /** plan direction of the first pipe, for orienting the symbol */
  axis: PlanPoint;
  warned: boolean;
  selected: boolean;
}

export interface SceneArrow {
  node: string;
  at: PlanPoint;
  /** unit plan vector the water pushes the fitting */
  direction: PlanPoint;
  /** N, horizontal part shown by the arrow's length */
  horizontal: number;
  /** N, vertical part (up +), shown in the label */
  vertical: number;
}

/** A plan polygon in metres: bearing blocks, anchors and trench pads. */
export interface ScenePolygon {
  node: string;
  kind: 'block' | 'anchor' | 'pad';
  points: PlanPoint[];
}

/**
 * A restrained zone: the leg of a fitting whose joints must be restrained, drawn as the pipe with a
 * tick at every restrained joint and a dimension line giving the length. Plan metres.
 */
export interface SceneZone {
  node: string;
  pipe: string;
  /** the fitting, where the zone starts */
  at: PlanPoint;
  /** unit plan vector along the leg, away from the fitting */
  direction: PlanPoint;
  /** m on plan drawn: the restrained length along the pipe, held to the pipe's end, projected on plan */
  planLength: number;
  /** m along the pipe, as scheduled (may run past the next fitting) */
  length: number;
  /** joints to restrain at the laying length, the fitting's own first */
  joints: number;
  /** m on plan from the fitting of each restrained joint on this pipe */
  jointsAt: number[];
  /** which side of the pipe the dimension line stands: +1 left of `direction`, −1 right */
  side: 1 | -1;
}

export interface Scene {
  pipes: ScenePipe[];
  fittings: SceneFitting[];
  arrows: SceneArrow[];
  polygons: ScenePolygon[];
  zones: SceneZone[];
  /** N, the largest arrow force, for the one arrow scale of the plan */
  largestForce: number;
  /** plan positions of free nodes and tie-ins (no fitting), so they can be picked; a tie-in has a mark */
  plainNodes: { id: string; at: PlanPoint; tieIn: boolean; mark: string | null; selected: boolean }[];
}

const plan = (v: Vec3): PlanPoint => ({ x: v[0], y: v[1] });

/** A rectangle from a centre line (p → q) and a width, as four plan points. */
function strip(p: PlanPoint, q: PlanPoint, width: number): PlanPoint[] {
  const dx = q.x - p.x,
    dy = q.y - p.y;
  const l = Math.hypot(dx, dy) || 1;
  const nx = (-dy / l) * (width / 2),
    ny = (dx / l) * (width / 2);
  return [
    { x: p.x + nx, y: p.y + ny },
    { x: q.x + nx, y: q.y + ny },
    { x: q.x - nx, y: q.y - ny },
    { x: p.x - nx, y: p.y - ny },
  ];
}

/**
 * The zone of one restrained leg. Its dimension line stands on the side away from the fitting's other
 * pipes (outside a bend), so that two legs' lines do not cross; a lone leg takes its left.
 */
function restrainedZone(
  node: string,
  at: PlanPoint,
  leg: Leg,
  length: number,
  legs: readonly Leg[],
  layingLength: number,
): SceneZone | null {
  const flat = Math.hypot(leg.direction[0], leg.direction[1]);
  if (flat < 1e-9) return null; // a vertical pipe has no length on plan
  const direction = { x: leg.direction[0] / flat, y: leg.direction[1] / flat };
  const planLength = Math.min(length, leg.length) * flat;
  const left = { x: -direction.y, y: direction.x };
  const others = legs
    .filter((o) => o !== leg)
    .reduce((s, o) => s + o.direction[0] * left.x + o.direction[1] * left.y, 0);
  return {
    node,
    pipe: leg.pipe.id,
    at,
    direction,
    planLength,
    length,
    joints: restrainedJointCount(length, layingLength),
    jointsAt: restrainedJointPositions(length, layingLength)
      .map((d) => d * flat)
      .filter((d) => d <= planLength + 1e-9),
    side: others > 1e-9 ? -1 : 1,
  };
}

/** The thrust the plan shows at a fitting for the chosen view: one case's total, or the governing one. */
function shownThrust(f: Analysis['fittings'][number], view: CaseView): Vec3 {
  if (view.kind === 'case') return f.cases.find((c) => c.caseId === view.id)?.total ?? f.envelope.governing.total;
  return f.envelope.governing.total;
}

/**
 * Everything the plan draws, in plan metres: a pure function of the document, its analysis, the
 * case shown, the selection and any nodes being dragged (drawn where they are, without results).
 */
export function planScene(
  project: Project,
  analysis: Analysis | null,
  view: CaseView,
  selection: Selection,
  preview: ReadonlyMap<string, PlanPoint> | null,
  hidden?: ReadonlySet<string>,
): Scene {
  const where = positions(project.nodes, preview);
  const pipes = scenePipes(project.pipes, where, selection.pipes, hidden);
  const fittings: SceneFitting[] = [];
  const arrows: SceneArrow[] = [];
  const polygons: ScenePolygon[] = [];
  const zones: SceneZone[] = [];
  let largestForce = 0;
  for (const f of analysis?.fittings ?? []) {
    const id = f.node.id;
    if (hidden?.has(id)) continue;
    const at = where.get(id);
    if (!at) continue;
    const leg0 = f.legs[0];
    fittings.push({
      node: id,
      mark: f.mark,
      kind: f.geometry.kind,
      at,
      axis: leg0 ? plan(leg0.direction) : { x: 1, y: 0 },
      warned: f.diagnostics.some((d) => d.severity !== 'info'),
      selected: selection.nodes.has(id),
    });
    if (preview?.has(id)) continue; // results follow on drop
    const t = shownThrust(f, view);
    const h = horizontalNorm(t);
    if (norm(t) > 0) {
      arrows.push({
        node: id,
        at,
        direction: h > 0 ? { x: t[0] / h, y: t[1] / h } : { x: 0, y: 0 },
        horizontal: h,
        vertical: t[2],
      });
      if (h > largestForce) largestForce = h;
    }
    const r = f.restraint;
    let od = -Infinity;
    for (const l of f.legs) if (l.pipe.outsideDiameter > od) od = l.pipe.outsideDiameter;
    for (const block of [r.block, r.reverseBlock]) {
      if (!block) continue;
      const dx = block.direction[0],
        dy = block.direction[1];
      const p = { x: at.x + (dx * od) / 2, y: at.y + (dy * od) / 2 };
      const q = { x: p.x + dx * block.depth, y: p.y + dy * block.depth };
      polygons.push({ node: id, kind: 'block', points: strip(p, q, block.faceWidth) });
    }
    if (r.anchor) {
      const s = r.anchor.side / 2;
      polygons.push({
        node: id,
        kind: 'anchor',
        points: [
          { x: at.x - s, y: at.y - s },
          { x: at.x + s, y: at.y - s },
          { x: at.x + s, y: at.y + s },
          { x: at.x - s, y: at.y + s },
        ],
      });
    }
    if (r.trenchBottom && leg0) {
      const d = plan(leg0.direction);
      const half = r.trenchBottom.length / 2;
      polygons.push({
        node: id,
        kind: 'pad',
        points: strip(
          { x: at.x - d.x * half, y: at.y - d.y * half },
          { x: at.x + d.x * half, y: at.y + d.y * half },
          r.trenchBottom.width,
        ),
      });
    }
    for (const leg of r.restrainedLegs) {
      const l = f.legs.find((x) => x.pipe.id === leg.pipe);
      const z = l && restrainedZone(id, at, l, leg.length, f.legs, project.design.layingLength);
      if (z) zones.push(z);
    }
  }
  const plainNodes = scenePlainNodes(project.nodes, where, analysis, selection.nodes, hidden);
  return { pipes, fittings, arrows, polygons, zones, largestForce, plainNodes };
}

// The parts of a scene that no result changes (where the nodes are, the pipes, the plain nodes) are
// kept from the last scene made of the same route: a test-pressure change, the slider's every step,
// rebuilds only the arrows, blocks and zones. Each cache is keyed by the document's own arrays, which
// every edit of the route replaces, and holds only what the key reaches.

const placed = new WeakMap<readonly ProjectNode[], Map<string, PlanPoint>>();

/** Plan position of every node: where it is dragged to, else where it stands. */
function positions(
  nodes: readonly ProjectNode[],
  preview: ReadonlyMap<string, PlanPoint> | null,
): ReadonlyMap<string, PlanPoint> {
  if (preview) return new Map(nodes.map((n) => [n.id, preview.get(n.id) ?? { x: n.x, y: n.y }]));
  let where = placed.get(nodes);
  if (!where) {
    where = new Map(nodes.map((n) => [n.id, { x: n.x, y: n.y }]));
    placed.set(nodes, where);
  }
  return where;
}

const pipeParts = keptPer<readonly Pipe[], ScenePipe[]>();

function scenePipes(
  all: readonly Pipe[],
  where: ReadonlyMap<string, PlanPoint>,
  selected: ReadonlySet<string>,
  hidden?: ReadonlySet<string>,
): ScenePipe[] {
  return pipeParts(all, [where, selected, hidden], () =>
    (hidden?.size ? all.filter((p) => !hidden.has(p.from) && !hidden.has(p.to)) : all).map((p) => ({
      id: p.id,
      a: where.get(p.from)!,
      b: where.get(p.to)!,
      outsideDiameter: p.outsideDiameter,
      material: p.material,
      selected: selected.has(p.id),
    })),
  );
}

type Plain = Scene['plainNodes'][number];

const plainParts = keptPer<ReadonlyMap<string, PlanPoint>, Plain[]>();

/**
 * Free nodes and tie-ins (no fitting). Which nodes are fittings follows from the nodes and their legs,
 * so the list is kept while the node positions, the analysis's legs and marks and the selection are.
 */
function scenePlainNodes(
  nodes: readonly ProjectNode[],
  where: ReadonlyMap<string, PlanPoint>,
  analysis: Analysis | null,
  selected: ReadonlySet<string>,
  hidden?: ReadonlySet<string>,
): Plain[] {
  const legs = analysis?.legs ?? null;
  const marks = analysis?.marks ?? null;
  return plainParts(where, [legs, marks, selected, hidden], () => {
    const withFitting = new Set<string>();
    for (const f of analysis?.fittings ?? []) withFitting.add(f.node.id);
    return nodes
      .filter((n) => !withFitting.has(n.id) && !hidden?.has(n.id))
      .map((n) => ({
        id: n.id,
        at: where.get(n.id)!,
        tieIn: n.end === 'tie-in',
        // A tie-in is numbered along its run (restrained legs run "toward A1"), so the plan shows its mark.
        mark: marks?.get(n.id) ?? null,
        selected: selected.has(n.id),
      }));
  });
}
