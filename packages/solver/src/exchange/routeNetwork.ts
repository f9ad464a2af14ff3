import type { Pipe, ProjectNode } from '../model/projectSchema.js';
import { pipeLevelFor } from '../model/groundLevel.js';
import type { PipeChoice } from './pipeChoice.js';
import { pointText, type ImportNote } from './importNotes.js';

/** One surveyed or drawn point of a run, in plan metres. */
export interface RoutePoint {
  x: number;
  y: number;
  /** m, the level the file gives (ground or pipe centreline, per the options), or null */
  level: number | null;
  /** where the point is in the file, for messages */
  where: string;
}

/** A run as a file gives it: its points in order and its pipe. */
export interface RouteLine {
  /** the feature or run it came from, for messages: `features[2] "Elm Lane"` */
  name: string;
  points: RoutePoint[];
  pipe: PipeChoice;
}

export interface NetworkOptions {
  /** m: points closer than this are one node; a point this close to another run joins it as a tee */
  tolerance: number;
  /** what the levels are: the ground surface (the pipe goes `cover` below) or the pipe centreline */
  levels: 'ground' | 'pipe';
  /** m, ground surface to top of pipe */
  cover: number;
  /** m, pipe centreline where the file gives no level */
  defaultElevation: number;
}

export interface Network {
  nodes: ProjectNode[];
  pipes: Pipe[];
  notes: ImportNote[];
}

interface Vertex {
  x: number;
  y: number;
  level: number | null;
  where: string;
}

const dist = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y);

/** A uniform grid over the plan, so that finding what is near a point does not look at everything. */
class Grid<T> {
  private cells = new Map<string, T[]>();
  constructor(private size: number) {}
  private key = (i: number, j: number) => `${i},${j}`;
  addBox(minX: number, minY: number, maxX: number, maxY: number, item: T) {
    const s = this.size;
    for (let i = Math.floor(minX / s); i <= Math.floor(maxX / s); i++)
      for (let j = Math.floor(minY / s); j <= Math.floor(maxY / s); j++) {
        const k = this.key(i, j);
        const list = this.cells.get(k);
        if (list) list.push(item);
        else this.cells.set(k, [item]);
      }
  }
  near(x: number, y: number): T[] {
    const s = this.size;
    const i = Math.floor(x / s);
    const j = Math.floor(y / s);
    const out: T[] = [];
    for (let di = -1; di <= 1; di++)
      for (let dj = -1; dj <= 1; dj++) out.push(...(this.cells.get(this.key(i + di, j + dj)) ?? []));
    return out;
  }
  at(x: number, y: number): T[] {
    return this.cells.get(this.key(Math.floor(x / this.size), Math.floor(y / this.size))) ?? [];
  }
  /**
   * Adds `item` to every cell within `grow` of the segment a–b, walking along it, and returns those
   * cells. A segment's bounding box would do for short ones, but a long diagonal one (a survey leg of
   * 30 km) covers millions of cells that it never comes near.
   */
  addSegment(ax: number, ay: number, bx: number, by: number, grow: number, item: T): string[] {
    const s = this.size;
    const step = s / 2;
    const n = Math.max(1, Math.ceil(Math.hypot(bx - ax, by - ay) / step));
    // a point within `grow` of the segment is within grow + step/2 of one of the samples
    const r = grow + step / 2;
    const keys = new Set<string>();
    for (let q = 0; q <= n; q++) {
      const x = ax + ((bx - ax) * q) / n;
      const y = ay + ((by - ay) * q) / n;
      for (let i = Math.floor((x - r) / s); i <= Math.floor((x + r) / s); i++)
        for (let j = Math.floor((y - r) / s); j <= Math.floor((y + r) / s); j++) keys.add(this.key(i, j));
    }
    for (const k of keys) {
      const list = this.cells.get(k);
      if (list) list.push(item);
      else this.cells.set(k, [item]);
    }
    return [...keys];
  }
  inCell(key: string): T[] {
    return this.cells.get(key) ?? [];
  }
}

/**
 * Joins the runs of a file into one network (routes.md, "How points are joined"): points of any runs
 * within `tolerance` of each other become one node; a point within `tolerance` of another run's pipe,
 * away from its ends, splits that pipe there and becomes a tee. Whatever cannot be joined is kept and
 * reported: runs left apart from the rest, runs crossing without a shared point, a pipe drawn twice.
 */
export function buildNetwork(lines: readonly RouteLine[], options: NetworkOptions): Network {
  const notes: ImportNote[] = [];
  const tol = options.tolerance;
  const vertices: Vertex[] = [];
  const vertexGrid = new Grid<number>(Math.max(tol, 1e-6));
  // Each line as a list of vertex indices.
  const chains: { line: RouteLine; ids: number[] }[] = [];

  const vertexFor = (p: RoutePoint): number => {
    let found = -1;
    let best = Infinity;
    for (const v of vertexGrid.near(p.x, p.y)) {
      const d = dist(vertices[v]!, p);
      if (d <= tol && d < best) {
        best = d;
        found = v;
      }
    }
    if (found >= 0) {
      const v = vertices[found]!;
      if (v.level === null && p.level !== null) v.level = p.level;
      else if (v.level !== null && p.level !== null && Math.abs(v.level - p.level) > 0.01)
        notes.push({
          level: 'warning',
          where: p.where,
          message: `joins ${v.where} (${best.toFixed(3)} m apart) but its level differs by ${Math.abs(v.level - p.level).toFixed(3)} m; the first level (${v.level.toFixed(3)} m) was taken`,
        });
      return found;
    }
    vertices.push({ x: p.x, y: p.y, level: p.level, where: p.where });
    const id = vertices.length - 1;
    vertexGrid.addBox(p.x, p.y, p.x, p.y, id);
    return id;
  };

  for (const line of lines) {
    const ids: number[] = [];
    for (const p of line.points) {
      const v = vertexFor(p);
      if (ids.length && ids[ids.length - 1] === v) {
        notes.push({
          level: 'note',
          where: p.where,
          message: `lies within ${tol} m of the point before it on the same run: the two are one node`,
        });
        continue;
      }
      ids.push(v);
    }
    if (ids.length < 2) {
      notes.push({
        level: 'warning',
        where: line.name,
        message: `has fewer than two distinct points (within ${tol} m of each other): not a run, no pipe made from it`,
      });
      continue;
    }
    chains.push({ line, ids });
  }

  // Tees: a vertex lying on another segment, away from its ends, splits that segment.
  const segGrid = segmentGrid(chains, vertices, tol).grid;
  const inserts = new Map<string, { t: number; v: number }[]>();
  vertices.forEach((p, vi) => {
    for (const [ci, k] of segGrid.at(p.x, p.y)) {
      const ids = chains[ci]!.ids;
      const ia = ids[k]!;
      const ib = ids[k + 1]!;
      if (ia === vi || ib === vi) continue;
      const a = vertices[ia]!;
      const b = vertices[ib]!;
      const dx = b.x - a.x;
      const dy = b.y - a.y;
      const len2 = dx * dx + dy * dy;
      const t = ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2;
      if (t <= 0 || t >= 1) continue;
      const off = Math.abs((p.x - a.x) * dy - (p.y - a.y) * dx) / Math.sqrt(len2);
      if (off > tol) continue;
      const key = `${ci}:${k}`;
      const list = inserts.get(key) ?? [];
      if (!list.some((e) => e.v === vi)) list.push({ t, v: vi });
      inserts.set(key, list);
    }
  });
  for (const [key, list] of inserts) {
    const [ci, k] = key.split(':').map(Number) as [number, number];
    const a = vertices[chains[ci]!.ids[k]!]!;
    const b = vertices[chains[ci]!.ids[k + 1]!]!;
    for (const { t, v } of list) {
      const p = vertices[v]!;
      // A point on a run takes the run's level there when it has none of its own.
      if (p.level === null && a.level !== null && b.level !== null) p.level = a.level + t * (b.level - a.level);
      notes.push({
        level: 'note',
        where: p.where,
        message: `lies on ${chains[ci]!.line.name} between ${a.where} and ${b.where}: joined to it as a tee`,
      });
    }
  }
  // Splice the inserted vertices into their chains, by segment and by position along it.
  chains.forEach((c, ci) => {
    const out: number[] = [c.ids[0]!];
    for (let k = 0; k + 1 < c.ids.length; k++) {
      const extra = (inserts.get(`${ci}:${k}`) ?? []).sort((p, q) => p.t - q.t);
      for (const e of extra) if (out[out.length - 1] !== e.v) out.push(e.v);
      out.push(c.ids[k + 1]!);
    }
    c.ids = out;
  });

  // Pipes, one per segment; a segment drawn twice (two features along the same line) is made once.
  const used = new Set<number>();
  const made = new Map<string, string>();
  const pipes: Pipe[] = [];
  const odAt = new Map<number, number>();
  for (const c of chains) {
    for (let k = 0; k + 1 < c.ids.length; k++) {
      const a = c.ids[k]!;
      const b = c.ids[k + 1]!;
      const key = a < b ? `${a}:${b}` : `${b}:${a}`;
      const first = made.get(key);
      if (first !== undefined) {
        notes.push({
          level: 'warning',
          where: c.line.name,
          message: `runs from ${vertices[a]!.where} to ${vertices[b]!.where} along a pipe already made from ${first}: made once`,
        });
        continue;
      }
      made.set(key, c.line.name);
      used.add(a);
      used.add(b);
      const p = c.line.pipe;
      odAt.set(a, Math.max(odAt.get(a) ?? 0, p.outsideDiameter));
      odAt.set(b, Math.max(odAt.get(b) ?? 0, p.outsideDiameter));
      pipes.push({
        id: `p${pipes.length + 1}`,
        from: `v${a}`,
        to: `v${b}`,
        outsideDiameter: p.outsideDiameter,
        insideDiameter: p.insideDiameter,
        flow: 0,
        material: p.material,
        series: p.series,
        nominal: p.nominal,
        label: c.line.name.slice(0, 80),
      });
    }
  }

  // Node ids in the order the file gives the points: n1, n2, ...
  const nodeId = new Map<number, string>();
  const nodes: ProjectNode[] = [];
  vertices.forEach((v, i) => {
    if (!used.has(i)) return;
    const id = `n${nodes.length + 1}`;
    nodeId.set(i, id);
    const od = odAt.get(i) ?? 0;
    const base = { id, x: round(v.x), y: round(v.y), end: 'cap' as const, valve: false, restraint: 'block' as const };
    if (v.level === null) nodes.push({ ...base, elevation: options.defaultElevation, cover: options.cover });
    else if (options.levels === 'pipe') nodes.push({ ...base, elevation: round(v.level), cover: options.cover });
    else
      nodes.push({
        ...base,
        elevation: round(pipeLevelFor(v.level, options.cover, od)),
        cover: options.cover,
        groundLevel: round(v.level),
      });
  });
  for (const p of pipes) {
    p.from = nodeId.get(Number(p.from.slice(1)))!;
    p.to = nodeId.get(Number(p.to.slice(1)))!;
  }

  notes.push(...apartNotes(nodes, pipes, chains, nodeId, vertices));
  notes.push(...crossingNotes(chains, segmentGrid(chains, vertices, tol), vertices, tol));
  return { nodes, pipes, notes };
}

interface SegmentGrid {
  grid: Grid<[number, number]>;
  /** the cells each segment lies in, by chain and segment */
  cells: string[][][];
}

/**
 * Every segment of every chain in a grid, in the cells within the tolerance of it. The cell is at
 * least 4 × the tolerance and 5 m, and grows with the total length of the route so that walking the
 * segments visits about a million cells at most, however long a leg the file holds.
 */
function segmentGrid(chains: { ids: number[] }[], vertices: Vertex[], tol: number): SegmentGrid {
  let total = 0;
  for (const c of chains)
    for (let k = 0; k + 1 < c.ids.length; k++) total += dist(vertices[c.ids[k]!]!, vertices[c.ids[k + 1]!]!);
  const grid = new Grid<[number, number]>(Math.max(tol * 4, 5, total / 1e6));
  const cells = chains.map((c, ci) => {
    const out: string[][] = [];
    for (let k = 0; k + 1 < c.ids.length; k++) {
      const a = vertices[c.ids[k]!]!;
      const b = vertices[c.ids[k + 1]!]!;
      out.push(grid.addSegment(a.x, a.y, b.x, b.y, tol, [ci, k]));
    }
    return out;
  });
  return { grid, cells };
}

const round = (v: number) => Math.round(v * 1e6) / 1e6;

/** Networks left apart from the largest one: kept, and each named with its gap to the rest. */
function apartNotes(
  nodes: ProjectNode[],
  pipes: Pipe[],
  chains: { line: RouteLine; ids: number[] }[],
  nodeId: Map<number, string>,
  vertices: Vertex[],
): ImportNote[] {
  const parent = new Map(nodes.map((n) => [n.id, n.id]));
  // Union–find with the whole path compressed (Tarjan 1975): compressing only the first node left a
  // route's chain of parents for every later find to walk, and a long route quadratic.
  const find = (a: string): string => {
    let r = a;
    while (parent.get(r) !== r) r = parent.get(r)!;
    for (let x = a; x !== r;) {
      const next = parent.get(x)!;
      parent.set(x, r);
      x = next;
    }
    return r;
  };
  for (const p of pipes) parent.set(find(p.from), find(p.to));
  const groups = new Map<string, string[]>();
  for (const n of nodes) {
    const r = find(n.id);
    const list = groups.get(r);
    if (list) list.push(n.id);
    else groups.set(r, [n.id]);
  }
  if (groups.size < 2) return [];
  const sorted = [...groups.values()].sort((a, b) => b.length - a.length);
  const main = new Set(sorted[0]);
  const byId = new Map(nodes.map((n) => [n.id, n]));
  const out: ImportNote[] = [];
  for (const group of sorted.slice(1)) {
    const members = new Set(group);
    const names = [
      ...new Set(chains.filter((c) => c.ids.some((v) => members.has(nodeId.get(v) ?? ''))).map((c) => c.line.name)),
    ];
    let gap = Infinity;
    let at = '';
    for (const id of group) {
      const a = byId.get(id)!;
      for (const m of main) {
        const b = byId.get(m)!;
        const d = dist(a, b);
        if (d < gap) {
          gap = d;
          const v = [...nodeId].find(([, n]) => n === id)![0];
          at = vertices[v]!.where;
        }
      }
    }
    out.push({
      level: 'warning',
      where: names.join(', '),
      message: `not joined to the rest of the network (nearest gap ${gap.toFixed(3)} m, at ${at}): imported as a separate line; move its end onto the main or raise the tolerance`,
    });
  }
  return out;
}

/** Two pipes crossing in plan without a shared point: not a fitting, reported so the user decides. */
function crossingNotes(
  chains: { line: RouteLine; ids: number[] }[],
  segGrid: SegmentGrid,
  vertices: Vertex[],
  tol: number,
): ImportNote[] {
  const out: ImportNote[] = [];
  const seen = new Set<string>();
  chains.forEach((c, ci) => {
    for (let k = 0; k + 1 < c.ids.length; k++) {
      const a = vertices[c.ids[k]!]!;
      const b = vertices[c.ids[k + 1]!]!;
      // Two segments that cross share the cell of the crossing point.
      const cands = new Set<string>();
      for (const cell of segGrid.cells[ci]![k]!)
        for (const [cj, kj] of segGrid.grid.inCell(cell))
          if (cj > ci || (cj === ci && kj > k + 1)) cands.add(`${cj}:${kj}`);
      for (const key of cands) {
        const [cj, kj] = key.split(':').map(Number) as [number, number];
        const ids = chains[cj]!.ids;
        if (kj + 1 >= ids.length) continue;
        const shared = [c.ids[k], c.ids[k + 1]].some((v) => v === ids[kj] || v === ids[kj + 1]);
        if (shared) continue;
        const p = vertices[ids[kj]!]!;
        const q = vertices[ids[kj + 1]!]!;
        const hit = intersection(a, b, p, q);
        if (!hit) continue;
        const tag = `${Math.round(hit.x / tol)},${Math.round(hit.y / tol)}`;
        if (seen.has(tag)) continue;
        seen.add(tag);
        out.push({
          level: 'warning',
          where: `${c.line.name} and ${chains[cj]!.line.name}`,
          message: `cross at ${pointText(hit.x, hit.y)} without a shared point: not joined (a crossing is not a fitting unless the file puts a point there)`,
        });
      }
    }
  });
  return out;
}

function intersection(
  a: { x: number; y: number },
  b: { x: number; y: number },
  p: { x: number; y: number },
  q: { x: number; y: number },
): { x: number; y: number } | null {
  const rx = b.x - a.x;
  const ry = b.y - a.y;
  const sx = q.x - p.x;
  const sy = q.y - p.y;
  const den = rx * sy - ry * sx;
  if (Math.abs(den) < 1e-12) return null;
  const t = ((p.x - a.x) * sy - (p.y - a.y) * sx) / den;
  const u = ((p.x - a.x) * ry - (p.y - a.y) * rx) / den;
  if (t <= 1e-9 || t >= 1 - 1e-9 || u <= 1e-9 || u >= 1 - 1e-9) return null;
  return { x: a.x + t * rx, y: a.y + t * ry };
}
