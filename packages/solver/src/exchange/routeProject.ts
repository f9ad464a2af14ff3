import { parseProject } from '../model/parseProject.js';
import { problemText } from '../model/problems.js';
import type { Project } from '../model/projectSchema.js';
import { findLibrarySoil, librarySoilToProject } from '../restraint/soilLibrary.js';
import { buildNetwork, type NetworkOptions, type RouteLine } from './routeNetwork.js';
import { readGeoJsonRoute } from './geojsonRoute.js';
import { readCsvTable, surveyLines, type ColumnMapping, type SurveyUnit } from './csvSurvey.js';
import { defaultPipe, type PipeChoice } from './pipeChoice.js';
import type { ImportNote } from './importNotes.js';
import { projectionOf } from './localProjection.js';
import { quantityText } from '../schedule/columnUnits.js';

export interface ImportOptions {
  /** m, points closer than this are one node (default 0.1 m) */
  tolerance?: number;
  /** what the file's levels are (default: the ground surface) */
  levels?: 'ground' | 'pipe';
  /** m, ground to top of pipe (default 1.2 m) */
  cover?: number;
  /** m, pipe centreline where the file has no levels (default 100 m, as a new drawing) */
  defaultElevation?: number;
  /** pipe of runs that name none (default EN 545 DN200; US units: AWWA C151 PC350 8 in) */
  pipe?: PipeChoice;
  /** project name */
  name?: string;
  /**
   * where the cases' pressures are stated: kept as the base project has them, or moved to the route's
   * highest pipe centreline (the default: a new route's levels are its own, not the base's datum)
   */
  caseDatum?: 'keep' | 'high-point';
}

export type ImportResult = { ok: true; project: Project; notes: ImportNote[] } | { ok: false; notes: ImportNote[] };

export const DEFAULT_TOLERANCE = 0.1;
export const DEFAULT_COVER = 1.2;

/**
 * What an import keeps of the project it starts from: cases, soils, design; the route is replaced.
 * Without one: the app's blank project's three cases (at a 100 m datum) and the common-practice sand.
 */
export function importBase(units: 'si' | 'us'): Omit<Project, 'nodes' | 'pipes'> {
  const r = parseProject({
    format: 'mainbrace-project',
    version: 1,
    units,
    loadCases: [
      { id: 'working', label: 'Working', kind: 'working', pressure: 600e3, datumElevation: 100 },
      { id: 'surge', label: 'Working + surge', kind: 'surge', pressure: 900e3, datumElevation: 100 },
      { id: 'test', label: 'Field test', kind: 'test', pressure: 1000e3, datumElevation: 100, flowFactor: 0 },
    ],
    soils: [{ ...librarySoilToProject(findLibrarySoil('sand-cp')!, 'sand'), label: 'Sand' }],
    defaultSoil: 'sand',
  });
  if (!r.ok) throw new Error(r.problems.map(problemText).join('; '));
  const { nodes: _n, pipes: _p, ...rest } = r.project;
  return rest;
}

function networkOptions(o: ImportOptions): NetworkOptions {
  return {
    tolerance: o.tolerance ?? DEFAULT_TOLERANCE,
    levels: o.levels ?? 'ground',
    cover: o.cover ?? DEFAULT_COVER,
    defaultElevation: o.defaultElevation ?? 100,
  };
}

/** Joins the runs into a network on the base project and checks the result as any project file. */
function assemble(
  lines: RouteLine[],
  o: ImportOptions,
  base: Omit<Project, 'nodes' | 'pipes'>,
  notes: ImportNote[],
  georeference: Project['georeference'],
): ImportResult {
  const net = buildNetwork(lines, networkOptions(o));
  for (const n of net.notes) notes.push(n); // no spread: a long survey has more notes than a call takes
  if (net.pipes.length === 0) {
    notes.push({
      level: 'error',
      where: '',
      message: 'no pipe could be made: the file has no run of two or more points',
    });
    return { ok: false, notes };
  }
  const { georeference: _g, ...rest } = base;
  let loadCases = rest.loadCases;
  if ((o.caseDatum ?? 'high-point') === 'high-point') {
    const high = net.nodes.reduce((h, n) => Math.max(h, n.elevation), -Infinity);
    loadCases = loadCases.map((c) => (c.datumElevation === undefined ? c : { ...c, datumElevation: high }));
    notes.push({
      level: 'note',
      where: '',
      message: `the load cases' pressures are stated at the route's highest pipe centreline, ${quantityText(high, 'level', base.units)}: check them in the cases panel`,
    });
  }
  const candidate: Project = {
    ...rest,
    loadCases,
    ...(o.name !== undefined ? { name: o.name.slice(0, 200) } : {}),
    ...(georeference ? { georeference } : {}),
    nodes: net.nodes,
    pipes: net.pipes,
  };
  const r = parseProject(candidate);
  if (!r.ok) {
    for (const p of r.problems)
      notes.push({
        level: 'error',
        where: '',
        message: `the joined network is not a valid project: ${problemText(p)}`,
      });
    return { ok: false, notes };
  }
  return { ok: true, project: r.project, notes };
}

/** A project from a GeoJSON route (routes.md). Never throws. */
export function importGeoJson(
  text: string,
  o: ImportOptions = {},
  base: Omit<Project, 'nodes' | 'pipes'> = importBase('si'),
): ImportResult {
  const read = readGeoJsonRoute(text, o.pipe ?? defaultPipe());
  if (!read.ok) return read;
  const options = read.hasLevels ? o : { ...o, levels: 'pipe' as const };
  return assemble(read.lines, options, base, read.notes, { proj4: read.projection.proj4 });
}

/** Why proj4 cannot place a survey on the earth with this grid, or null when it can. */
function gridProblem(definition: string, first: { x: number; y: number } | undefined): string | null {
  const named = `the grid "${definition.slice(0, 60)}"`;
  try {
    const [lon, lat] = projectionOf(definition).inverse([first?.x ?? 0, first?.y ?? 0]);
    if (Number.isFinite(lon) && Number.isFinite(lat) && Math.abs(lat) <= 90) return null;
    return `${named} does not place the survey's first point on the earth: check its parameters (a UTM grid needs +zone)`;
  } catch (e) {
    return `${named} is not a projection proj4 can use (${(e as Error).message}): give its +proj=… definition (of EPSG codes only EPSG:4326 and EPSG:3857 are known)`;
  }
}

/** A project from a CSV survey (routes.md). Never throws. */
export function importCsv(
  text: string,
  mapping: ColumnMapping,
  unit: SurveyUnit,
  o: ImportOptions = {},
  base: Omit<Project, 'nodes' | 'pipes'> = importBase(unit === 'm' ? 'si' : 'us'),
  georeference?: Project['georeference'],
): ImportResult {
  const table = readCsvTable(text);
  if (!table.ok) return table;
  const pipe = o.pipe ?? (unit === 'm' ? defaultPipe() : defaultPipe('di-awwa-pc350', '8'));
  const lines = surveyLines(table.table, mapping, unit, pipe);
  if (!lines.ok) return lines;
  // A grid the export could not use is refused now, not when the design is exported.
  const grid = georeference?.proj4 === undefined ? null : gridProblem(georeference.proj4, lines.lines[0]?.points[0]);
  if (grid) return { ok: false, notes: [{ level: 'error', where: '', message: grid }] };
  // Feet are shown and written as international feet: a survey-foot coordinate reads 2 parts per
  // million larger (2.5 ft at 1,250,000), too much to set out against the survey's own control.
  const notes =
    unit === 'us-ft'
      ? [
          ...lines.notes,
          {
            level: 'warning' as const,
            where: '',
            message:
              'the survey is in US survey feet: Mainbrace keeps it in metres and shows feet as international feet (0.3048 m), which read 2 parts per million larger (E 1,250,000.00 sft reads 1,250,002.50 ft); set out against survey-foot control from the survey’s own figures or in metres',
          },
        ]
      : lines.notes;
  return assemble(lines.lines, o, base, notes, georeference);
}
