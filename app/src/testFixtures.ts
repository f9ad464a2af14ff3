import { expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { parseProject, type Project, type ProjectInput } from '@mainbrace/solver';
import type { PipeSpec } from './state/documentEdits.js';

/** Test fixtures: valid, defaulted projects from the few fields a test cares about. */
export interface NodeSpec {
  id: string;
  /** m east */
  x: number;
  /** m north */
  y: number;
  /** m, centreline elevation (100 unless given) */
  z?: number;
  cover?: number;
  end?: 'cap' | 'tie-in';
}

export interface PipeFixture {
  from: string;
  to: string;
  /** m, outside diameter (DN300 EN 545, 0.326 m, unless given) */
  od?: number;
  /** m³/s */
  flow?: number;
  label?: string;
}

/** DN300 EN 545 ductile iron, OD 326 mm (EN 545:2010; docs/check-values.md CV-9); the bore is an assumed 0.9 × OD. */
export const DN300: PipeSpec = { outsideDiameter: 0.326, insideDiameter: 0.2934, material: 'ductile-iron' };

/** Builds a project through the solver's own parser, so it is valid and carries every default. */
export function project(
  nodes: NodeSpec[],
  pipes: PipeFixture[],
  cases: ProjectInput['loadCases'] = [{ id: 'working', pressure: 1e6 }],
): Project {
  const input: ProjectInput = {
    format: 'mainbrace-project',
    version: 1,
    name: 'Test main, Lowmoor Lane',
    loadCases: cases,
    soils: [{ id: 'sand', bearing: 143640 }],
    nodes: nodes.map(({ z, ...n }) => ({ ...n, elevation: z ?? 100 })),
    pipes: pipes.map(({ od, ...p }, i) => {
      const outside = od ?? DN300.outsideDiameter;
      return { id: `p${i + 1}`, ...p, outsideDiameter: outside, insideDiameter: outside * 0.9 };
    }),
  };
  const r = parseProject(input);
  if (!r.ok) throw new Error(r.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return r.project;
}

/** An empty project: no route yet. */
export const emptyProject = (): Project => project([], []);

/** Asserts the document passes the solver's parser (the invariant every edit must keep). */
export function expectValid(p: Project): void {
  const r = parseProject(p);
  expect(r.ok ? [] : r.problems.map((x) => `${x.path}: ${x.message}`)).toEqual([]);
}

/** Asserts |actual − expected| ≤ tol: the one tolerance rule of these tests. */
export function expectClose(actual: number, expected: number, tol = 1e-9): void {
  if (!(Math.abs(actual - expected) <= tol)) expect.fail(`expected ${actual} to be within ${tol} of ${expected}`);
}

/** The plan position of a node. */
export function at(p: Project, id: string): { x: number; y: number } {
  const n = p.nodes.find((x) => x.id === id);
  if (!n) throw new Error(`no node ${id}`);
  return { x: n.x, y: n.y };
}

/** Each pipe as "from→to", in document order: the topology at a glance. */
export const links = (p: Project): string[] => p.pipes.map((x) => `${x.from}→${x.to}`);

/** A main through the given plan points (m): nodes n1, n2, … joined in order by pipes of the default size. */
export const chain = (...points: [number, number][]): Project =>
  project(
    points.map(([x, y], i) => ({ id: `n${i + 1}`, x, y })),
    points.slice(1).map((_, i) => ({ from: `n${i + 1}`, to: `n${i + 2}` })),
  );

/** The demo project as the app opens it (public/demo), checked by the solver's parser. */
export function demoProject(): Project {
  const r = parseProject(
    JSON.parse(readFileSync(resolve(import.meta.dirname, '../../public/demo/larkspur-rise.json'), 'utf8')),
  );
  if (!r.ok) throw new Error('demo does not parse');
  return r.project;
}

/** The records of a CSV (RFC 4180: a quoted field may hold commas and doubled quotes). */
export function csvRecords(text: string): string[][] {
  const records: string[][] = [];
  let record: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted && ch === '"' && text[i + 1] === '"') {
      field += '"';
      i++;
    } else if (ch === '"') quoted = !quoted;
    else if (quoted || (ch !== ',' && ch !== '\r' && ch !== '\n')) field += ch;
    else if (ch === ',') {
      record.push(field);
      field = '';
    } else if (ch === '\n') {
      records.push([...record, field]);
      record = [];
      field = '';
    }
  }
  return records;
}
