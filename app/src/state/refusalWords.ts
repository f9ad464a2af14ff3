import { LIMITS, type LimitId, type Problem, type Project, type UnitSystem } from '@mainbrace/solver';
import { show } from '../format/quantity.js';
import { CASE_FIELDS, DESIGN_FIELDS, NODE_FIELDS, PIPE_FIELDS, SOIL_FIELDS } from '../format/fieldLabels.js';

/** The plausibility range each field is held to (projectSchema.ts), for a bound worded in display units. */
const FIELD_LIMIT: Record<string, LimitId> = {
  pressure: 'pressure',
  datumElevation: 'elevation',
  elevation: 'elevation',
  groundLevel: 'elevation',
  groundwaterElevation: 'elevation',
  x: 'coordinate',
  y: 'coordinate',
  cover: 'cover',
  flowFactor: 'flowFactor',
  flow: 'flow',
  outsideDiameter: 'outsideDiameter',
  insideDiameter: 'insideDiameter',
  bearing: 'bearing',
  unitWeight: 'soilUnitWeight',
  frictionAngle: 'frictionAngle',
  cohesion: 'cohesion',
  bearingSafetyFactor: 'safetyFactor',
  upliftSafetyFactor: 'safetyFactor',
  restraintSafetyFactor: 'safetyFactor',
  concreteUnitWeight: 'concreteUnitWeight',
  blockDepth: 'blockDepth',
  layingLength: 'layingLength',
};

export interface Wording {
  /** the document the edit would have made */
  project: Project;
  units: UnitSystem;
  /** fitting marks by node id (A1, B2) as the plan and the schedule show them */
  marks: ReadonlyMap<string, string>;
}

type Named = { id: string; label?: string | undefined };

function nodeName(n: Named, w: Wording): string {
  return `node ${w.marks.get(n.id) ?? n.label ?? n.id}`;
}

/** The bound a value broke, in display units; null when it is within its range (another rule refused it). */
function boundText(field: string, value: unknown, w: Wording): string | null {
  const id = FIELD_LIMIT[field];
  if (!id || typeof value !== 'number' || !Number.isFinite(value)) return null;
  const l = LIMITS[id];
  const q = (v: number) => show(v, l.kind, w.units, 4);
  if (l.hard.exclusiveMin ? value <= l.hard.min : value < l.hard.min)
    return `must be ${l.hard.exclusiveMin ? 'more than' : 'at least'} ${q(l.hard.min)}`;
  if (value > l.hard.max) return `must be at most ${q(l.hard.max)}`;
  return null;
}

const PATH = /^(loadCases|nodes|pipes|soils)\[(\d+)\](?:\.(\w+))?$|^design\.(\w+)$/;

/**
 * One refusal of an edit in the words of the screen: the field as it is labelled there, of the case,
 * node, pipe or soil as the user knows it, and a broken bound in display units. A path with no
 * counterpart on screen keeps the checks' own words.
 */
export function refusalLine(p: Problem, w: Wording): string {
  const { nodes, pipes } = w.project;
  // A message naming another node or pipe by its place in the list or its id names it as the screen does.
  const message = p.message
    .replace(/nodes\[(\d+)\] \("[^"]*"\)/g, (all, i: string) => {
      const n = nodes[Number(i)];
      return n ? nodeName(n, w) : all;
    })
    .replace(/pipes\[(\d+)\] \("[^"]*"\)/g, (all, i: string) => {
      const x = pipes[Number(i)];
      return x ? `pipe ${x.label ?? x.id}` : all;
    })
    .replace(/node "([^"]*)"/g, (all, id: string) => {
      const n = nodes.find((x) => x.id === id);
      return n ? nodeName(n, w) : all;
    });
  const m = PATH.exec(p.path);
  if (!m) return p.path ? `${p.path}: ${message}` : message;
  const [, list, index, field, designField] = m;
  if (designField !== undefined) {
    const label = (DESIGN_FIELDS as Readonly<Record<string, string>>)[designField];
    if (!label) return `${p.path}: ${message}`;
    const value = (w.project.design as unknown as Record<string, unknown>)[designField];
    return `${label}: ${boundText(designField, value, w) ?? message}`;
  }
  const items = (w.project as unknown as Record<string, Named[]>)[list!] ?? [];
  const item = items[Number(index)];
  if (!item) return `${p.path}: ${message}`;
  const labels: Readonly<Record<string, string>> = {
    loadCases: CASE_FIELDS,
    nodes: NODE_FIELDS,
    pipes: PIPE_FIELDS,
    soils: SOIL_FIELDS,
  }[list as 'loadCases'];
  const owner =
    list === 'nodes' ? nodeName(item, w) : list === 'pipes' ? `pipe ${item.label ?? item.id}` : (item.label ?? item.id);
  if (field === undefined) return `${owner[0]!.toUpperCase()}${owner.slice(1)}: ${message}`;
  const label = labels[field];
  if (!label) return `${p.path}: ${message}`;
  const value = (item as unknown as Record<string, unknown>)[field];
  const joiner = list === 'nodes' ? 'at' : 'of';
  return `${label} ${joiner} ${owner}: ${boundText(field, value, w) ?? message}`;
}
