import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseProject } from '../src/model/parseProject.js';
import type { Project, ProjectInput } from '../src/model/projectSchema.js';
import { INCH, PSI, PSF } from '../src/units/conversions.js';

/** Test fixtures: a valid project from the few fields a test cares about. */
export type NodeSpec = { id: string; x: number; y: number; z?: number } & Record<string, unknown>;
export type PipeSpec = { id?: string; from: string; to: string; od: number; id_?: number; flow?: number } & Record<
  string,
  unknown
>;

export interface RouteSpec {
  nodes: NodeSpec[];
  pipes: PipeSpec[];
  /** Pa, one uniform case unless `cases` is given */
  pressure?: number;
  cases?: ProjectInput['loadCases'];
  soils?: ProjectInput['soils'];
  design?: ProjectInput['design'];
  units?: 'us' | 'si';
  density?: number;
}

/** The project file a spec describes, before validation. */
export function routeInput(spec: RouteSpec): ProjectInput {
  return {
    format: 'mainbrace-project',
    version: 1,
    name: 'Test route',
    units: spec.units ?? 'si',
    ...(spec.density !== undefined ? { water: { density: spec.density } } : {}),
    ...(spec.design ? { design: spec.design } : {}),
    loadCases: spec.cases ?? [{ id: 'only', pressure: spec.pressure ?? 1e6 }],
    soils: spec.soils ?? [{ id: 'sand', bearing: 4000 * PSF }],
    nodes: spec.nodes.map(({ id, x, y, z, ...rest }) => ({ id, x, y, elevation: z ?? 100, ...rest })),
    pipes: spec.pipes.map(({ id, from, to, od, id_, flow, ...rest }, i) => ({
      id: id ?? `p${i + 1}`,
      from,
      to,
      outsideDiameter: od,
      insideDiameter: id_ ?? od * 0.9,
      flow: flow ?? 0,
      ...rest,
    })),
  } as ProjectInput;
}

/** Validates a project input; throws with the problems if the fixture itself is wrong. */
export function validProject(input: unknown): Project {
  const parsed = parseProject(input);
  if (!parsed.ok) throw new Error(parsed.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return parsed.project;
}

/** The demo project file as the user opens it, not yet checked. */
export const demoInput = () =>
  JSON.parse(readFileSync(fileURLToPath(new URL('../../../public/demo/larkspur-rise.json', import.meta.url)), 'utf8'));

/** Builds and validates a project; throws with the problems if the fixture itself is wrong. */
export const route = (spec: RouteSpec): Project => validProject(routeInput(spec));

/** A bend of deflection `deg` at n2: in along +x, out turned left (counter-clockwise) by `deg`. */
export function bendRoute(deg: number, od: number, pressure: number): Project {
  const r = (deg * Math.PI) / 180;
  return route({
    pressure,
    nodes: [
      { id: 'n1', x: -10, y: 0 },
      { id: 'n2', x: 0, y: 0 },
      { id: 'n3', x: 10 * Math.cos(r), y: 10 * Math.sin(r) },
    ],
    pipes: [
      { from: 'n1', to: 'n2', od },
      { from: 'n2', to: 'n3', od },
    ],
  });
}

export const inches = (v: number) => v * INCH;
export const psi = (v: number) => v * PSI;
/** lbf → N */
export const LBF = 4.4482216152605;
