import { VALUES } from '../provenance/registerValues.js';
import { LIMITS, type LimitId } from './limits.js';
import type { Project } from './projectSchema.js';
import { MIN_PIPE_LENGTH, pipeBelowGround } from './routeRules.js';
import { routeRulesHold } from './routeCheck.js';
import { SMALLEST_VALUE } from './tinyNumbers.js';

/**
 * The project file checked by hand, without zod: the same rules as model/projectSchema.ts and
 * crossChecks.ts, written as plain loops so that a command-line process can accept a valid file
 * without loading and warming the schema library. It never words a refusal: anything it is not sure
 * of returns null, and the caller runs the schema to say what is wrong. A test holds the two to the
 * same answers and the same output over fixtures, and to the same fields.
 */

type Rec = Record<string, unknown>;

/** Thrown inside to give up: the schema decides. */
const NO = Symbol('no');
const no = (): never => {
  throw NO;
};

const isObject = (v: unknown): v is Rec => typeof v === 'object' && v !== null && !Array.isArray(v);

function num(v: unknown, id: LimitId | null): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) no();
  const n = v as number;
  if (n !== 0 && Math.abs(n) < SMALLEST_VALUE) no();
  if (id) {
    const h = LIMITS[id].hard;
    if (h.exclusiveMin ? !(n > h.min) : !(n >= h.min)) no();
    if (!(n <= h.max)) no();
  }
  return n;
}

function str(v: unknown, min: number, max: number): string {
  if (typeof v !== 'string' || v.length < min || v.length > max) no();
  return v as string;
}

const id = (v: unknown) => str(v, 1, 64);

function oneOf<T extends string>(v: unknown, values: readonly T[]): T {
  if (!values.includes(v as T)) no();
  return v as T;
}

/** Only the listed fields (strict objects): an unknown field is the schema's to word. */
function only(o: Rec, fields: readonly string[]): void {
  for (const k in o) if (!fields.includes(k)) no();
}

/** Sets `key` when the input has it (optional fields stay absent, as the schema leaves them). */
function opt<T>(out: Rec, o: Rec, key: string, read: (v: unknown) => T): void {
  if (o[key] !== undefined) out[key] = read(o[key]);
}

const SF = VALUES['design.safety-factor'];

export const QUICK_FIELDS = {
  project: [
    'format',
    'version',
    'name',
    'units',
    'water',
    'design',
    'loadCases',
    'soils',
    'defaultSoil',
    'nodes',
    'pipes',
    'georeference',
    'underlay',
    'sheet',
  ],
  georeference: ['proj4'],
  water: ['density'],
  design: [
    'thrustArea',
    'bearingSafetyFactor',
    'upliftSafetyFactor',
    'restraintSafetyFactor',
    'concreteUnitWeight',
    'groundwaterElevation',
    'blockDepth',
    'trenchWidth',
    'dimensionStep',
    'layingLength',
    'concreteWaste',
  ],
  loadCase: ['id', 'label', 'kind', 'pressure', 'datumElevation', 'flowFactor'],
  soil: [
    'id',
    'label',
    'bearing',
    'unitWeight',
    'frictionAngle',
    'cohesion',
    'bearingPerDepth',
    'verticalBearing',
    'minCover',
    'pipeFrictionRatio',
    'pipeAdhesionRatio',
    'source',
  ],
  node: ['id', 'x', 'y', 'elevation', 'cover', 'groundLevel', 'soil', 'end', 'valve', 'restraint', 'label'],
  pipe: [
    'id',
    'from',
    'to',
    'outsideDiameter',
    'insideDiameter',
    'flow',
    'material',
    'series',
    'nominal',
    'trenchType',
    'encasement',
    'weightPerLength',
    'label',
  ],
} as const;

const MATERIALS = ['ductile-iron', 'pvc', 'hdpe', 'steel', 'other'] as const;

function water(v: unknown): Project['water'] {
  if (v === undefined) return { density: VALUES['water.density'] };
  if (!isObject(v)) no();
  const o = v as Rec;
  only(o, QUICK_FIELDS.water);
  return { density: o.density === undefined ? VALUES['water.density'] : num(o.density, 'density') };
}

function design(v: unknown): Project['design'] {
  const o = (v === undefined ? {} : v) as Rec;
  if (!isObject(o)) no();
  only(o, QUICK_FIELDS.design);
  const or = <T>(key: string, read: (x: unknown) => T, fallback: T): T =>
    o[key] === undefined ? fallback : read(o[key]);
  const nullable = (limit: LimitId) => (x: unknown) => (x === null ? null : num(x, limit));
  return {
    thrustArea: or('thrustArea', (x) => oneOf(x, ['outside', 'inside'] as const), 'outside'),
    bearingSafetyFactor: or('bearingSafetyFactor', (x) => num(x, 'safetyFactor'), SF),
    upliftSafetyFactor: or('upliftSafetyFactor', (x) => num(x, 'safetyFactor'), SF),
    restraintSafetyFactor: or('restraintSafetyFactor', (x) => num(x, 'safetyFactor'), SF),
    concreteUnitWeight: or('concreteUnitWeight', (x) => num(x, 'concreteUnitWeight'), VALUES['concrete.unit-weight']),
    groundwaterElevation: or('groundwaterElevation', nullable('elevation'), null),
    blockDepth: or('blockDepth', (x) => num(x, 'blockDepth'), VALUES['design.block-depth']),
    trenchWidth: or('trenchWidth', nullable('trenchWidth'), null),
    dimensionStep: or('dimensionStep', (x) => num(x, 'dimensionStep'), VALUES['design.dimension-step']),
    layingLength: or('layingLength', (x) => num(x, 'layingLength'), 6),
    // absent stays absent, as the schema leaves it (the register's default applies)
    ...(o.concreteWaste === undefined ? {} : { concreteWaste: num(o.concreteWaste, 'concreteWaste') }),
  };
}

function list<T>(v: unknown, min: number, read: (x: unknown) => T): T[] {
  if (!Array.isArray(v) || v.length < min) no();
  const a = v as unknown[];
  const out = new Array<T>(a.length);
  for (let i = 0; i < a.length; i++) out[i] = read(a[i]);
  return out;
}

function loadCase(v: unknown): Project['loadCases'][number] {
  if (!isObject(v)) no();
  const o = v as Rec;
  only(o, QUICK_FIELDS.loadCase);
  const out: Rec = { id: id(o.id) };
  opt(out, o, 'label', (x) => str(x, 0, 80));
  opt(out, o, 'kind', (x) => oneOf(x, ['working', 'surge', 'test', 'other'] as const));
  out.pressure = num(o.pressure, 'pressure');
  opt(out, o, 'datumElevation', (x) => num(x, 'elevation'));
  out.flowFactor = o.flowFactor === undefined ? 1 : num(o.flowFactor, 'flowFactor');
  return out as Project['loadCases'][number];
}

function soil(v: unknown): Project['soils'][number] {
  if (!isObject(v)) no();
  const o = v as Rec;
  only(o, QUICK_FIELDS.soil);
  const out: Rec = { id: id(o.id) };
  opt(out, o, 'label', (x) => str(x, 0, 80));
  out.bearing = num(o.bearing, 'bearing');
  out.unitWeight = o.unitWeight === undefined ? 18000 : num(o.unitWeight, 'soilUnitWeight');
  out.frictionAngle = o.frictionAngle === undefined ? 30 : num(o.frictionAngle, 'frictionAngle');
  out.cohesion = o.cohesion === undefined ? 0 : num(o.cohesion, 'cohesion');
  opt(out, o, 'bearingPerDepth', (x) => num(x, 'bearingPerDepth'));
  opt(out, o, 'verticalBearing', (x) => num(x, 'bearing'));
  opt(out, o, 'minCover', (x) => num(x, 'minCover'));
  opt(out, o, 'pipeFrictionRatio', (x) => {
    const n = num(x, null);
    return n > 0 && n <= 1 ? n : no();
  });
  opt(out, o, 'pipeAdhesionRatio', (x) => num(x, 'ratio'));
  opt(out, o, 'source', (x) => str(x, 0, 400));
  return out as Project['soils'][number];
}

function node(v: unknown): Project['nodes'][number] {
  if (!isObject(v)) no();
  const o = v as Rec;
  only(o, QUICK_FIELDS.node);
  // Field by field in the schema's order, without a function made per field: this runs for every
  // node of a file the command line reads (10,000 and more).
  const out: Rec = {
    id: id(o.id),
    x: num(o.x, 'coordinate'),
    y: num(o.y, 'coordinate'),
    elevation: num(o.elevation, 'elevation'),
    cover: o.cover === undefined ? 1.2 : num(o.cover, 'cover'),
  };
  if (o.groundLevel !== undefined) out.groundLevel = num(o.groundLevel, 'elevation');
  if (o.soil !== undefined) out.soil = id(o.soil);
  out.end = o.end === undefined ? 'cap' : oneOf(o.end, ['cap', 'tie-in'] as const);
  out.valve = o.valve === undefined ? false : typeof o.valve === 'boolean' ? o.valve : no();
  out.restraint = o.restraint === undefined ? 'block' : oneOf(o.restraint, ['block', 'joints'] as const);
  if (o.label !== undefined) out.label = str(o.label, 0, 80);
  return out as Project['nodes'][number];
}

function pipe(v: unknown): Project['pipes'][number] {
  if (!isObject(v)) no();
  const o = v as Rec;
  only(o, QUICK_FIELDS.pipe);
  // As node(): straight through, for every pipe of the file.
  const out: Rec = {
    id: id(o.id),
    from: id(o.from),
    to: id(o.to),
    outsideDiameter: num(o.outsideDiameter, 'outsideDiameter'),
    insideDiameter: num(o.insideDiameter, 'insideDiameter'),
    flow: o.flow === undefined ? 0 : num(o.flow, 'flow'),
    material: o.material === undefined ? 'ductile-iron' : oneOf(o.material, MATERIALS),
  };
  if (o.series !== undefined) out.series = str(o.series, 0, 40);
  if (o.nominal !== undefined) out.nominal = str(o.nominal, 0, 20);
  if (o.trenchType !== undefined) {
    const n = num(o.trenchType, null);
    out.trenchType = Number.isInteger(n) && n >= 1 && n <= 5 ? n : no();
  }
  if (o.encasement !== undefined) out.encasement = oneOf(o.encasement, ['none', 'polyethylene'] as const);
  if (o.weightPerLength !== undefined) out.weightPerLength = num(o.weightPerLength, 'weightPerLength');
  if (o.label !== undefined) out.label = str(o.label, 0, 80);
  return out as Project['pipes'][number];
}

/**
 * True when two nodes may stand at one point without a pipe between them (crossChecks.ts words it):
 * nodes sorted by x, each compared with those less than MIN_PIPE_LENGTH further east. It finds every
 * pair the schema's grid finds (a pair that close is that close in x), without a string per cell.
 */
function mayCoincide(p: Project): boolean {
  const n = p.nodes;
  const order = Array.from(n.keys()).sort((a, b) => n[a]!.x - n[b]!.x);
  let joined: Set<string> | null = null;
  for (let k = 0; k < order.length; k++) {
    const a = n[order[k]!]!;
    for (let j = k + 1; j < order.length; j++) {
      const b = n[order[j]!]!;
      if (b.x - a.x >= MIN_PIPE_LENGTH) break;
      const dx = a.x - b.x,
        dy = a.y - b.y,
        dz = a.elevation - b.elevation;
      if (Math.sqrt(dx * dx + dy * dy + dz * dz) >= MIN_PIPE_LENGTH) continue;
      joined ??= new Set(p.pipes.map((x) => `${x.from}\u0000${x.to}`));
      if (!joined.has(`${a.id}\u0000${b.id}`) && !joined.has(`${b.id}\u0000${a.id}`)) return true;
    }
  }
  return false;
}

/**
 * The project a decoded JSON value describes, with its defaults, when it is certainly valid; null when
 * it may not be (the schema then decides and words the problems). Never throws.
 */
export function quickParse(data: unknown): Project | null {
  try {
    if (!isObject(data)) return null;
    const o = data;
    only(o, QUICK_FIELDS.project);
    if (o.format !== 'mainbrace-project' || o.version !== 1) return null;
    // A site-plan underlay (images, calibration) is the schema's to check: the solver never reads it.
    if (o.underlay !== undefined) return null;
    // So is the sheet's title block: the printed words, never read by the solver.
    if (o.sheet !== undefined) return null;
    const out: Rec = {
      format: 'mainbrace-project',
      version: 1,
      name: o.name === undefined ? 'Untitled main' : str(o.name, 0, 200),
      units: o.units === undefined ? 'si' : oneOf(o.units, ['us', 'si'] as const),
      water: water(o.water),
      design: design(o.design),
      loadCases: list(o.loadCases, 1, loadCase),
      soils: list(o.soils, 1, soil),
    };
    opt(out, o, 'defaultSoil', id);
    out.nodes = o.nodes === undefined ? [] : list(o.nodes, 0, node);
    out.pipes = o.pipes === undefined ? [] : list(o.pipes, 0, pipe);
    opt(out, o, 'georeference', (x) => {
      if (!isObject(x)) no();
      only(x as Rec, QUICK_FIELDS.georeference);
      return { proj4: str((x as Rec).proj4, 1, 400) };
    });
    const project = out as Project;
    if (!routeRulesHold(project)) return null;
    let problem = false;
    pipeBelowGround(project, () => {
      problem = true;
    });
    return problem || mayCoincide(project) ? null : project;
  } catch (e) {
    if (e === NO) return null;
    throw e;
  }
}
