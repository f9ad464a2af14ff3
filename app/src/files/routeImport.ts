import type { Project } from '@mainbrace/solver';
import type { ColumnMapping, ImportResult, SurveyUnit } from '@mainbrace/solver/exchange';
import { importOrReload } from '../chrome/loadChunk.js';
import { MAX_FILE_BYTES } from './projectFile.js';

/**
 * Routes from other programs: CSV surveys and GeoJSON routes (docs/routes.md). The CSV and projection
 * libraries come with the solver's exchange module, loaded only when a route is imported, so the app's
 * first load does not carry them.
 */
export const loadExchange = () => importOrReload(() => import('@mainbrace/solver/exchange'));

export type RouteKind = 'csv' | 'geojson';

const GEOJSON_TYPES = new Set(['FeatureCollection', 'Feature', 'LineString', 'MultiLineString', 'GeometryCollection']);

/** What a file holds: a project, a CSV survey or a GeoJSON route; by its name, and for .json by its content. */
export function fileKind(name: string, text: string): RouteKind | 'project' {
  if (/\.(csv|txt)$/i.test(name)) return 'csv';
  if (/\.geojson$/i.test(name)) return 'geojson';
  try {
    const data = JSON.parse(text) as { type?: unknown; format?: unknown };
    if (data && typeof data === 'object' && data.format === undefined && GEOJSON_TYPES.has(String(data.type)))
      return 'geojson';
  } catch {
    // Not JSON: the project reader says so, naming line and column.
  }
  return 'project';
}

/** A route file read and waiting for the user's choices in the import dialog. */
export interface PendingImport {
  name: string;
  text: string;
  kind: RouteKind;
  /** CSV: the header row, and the columns guessed from usual names */
  header: string[];
  guess: Partial<ColumnMapping>;
  /** GeoJSON: whether positions carry a third value (a level) */
  hasLevels: boolean;
}

/** The choices the import dialog asks for, once per file. SI lengths. */
export interface ImportChoices {
  mapping: ColumnMapping | null;
  unit: SurveyUnit;
  levels: 'ground' | 'pipe';
  cover: number;
  tolerance: number;
}

function positionsHaveLevels(data: unknown): boolean {
  // The first position found decides; the importer checks that every position agrees.
  let found: boolean | null = null;
  const walk = (v: unknown, depth: number) => {
    if (found !== null || depth > 8 || !v || typeof v !== 'object') return;
    if (Array.isArray(v)) {
      if (v.length >= 2 && typeof v[0] === 'number') found = v.length >= 3;
      else for (const x of v) walk(x, depth + 1);
      return;
    }
    for (const x of Object.values(v as Record<string, unknown>)) walk(x, depth + 1);
  };
  walk(data, 0);
  return found === true;
}

/** Reads a route file for the dialog; an error names the file and why. */
export async function prepareImport(
  file: File,
  text: string,
  kind: RouteKind,
): Promise<{ ok: true; pending: PendingImport } | { ok: false; lines: string[] }> {
  if (kind === 'csv') {
    const ex = await loadExchange();
    const t = ex.readCsvTable(text);
    if (!t.ok) return { ok: false, lines: t.notes.map(ex.noteText) };
    return {
      ok: true,
      pending: {
        name: file.name,
        text,
        kind,
        header: t.table.header,
        guess: ex.guessMapping(t.table.header),
        hasLevels: false,
      },
    };
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, lines: [`not valid JSON: ${(e as Error).message}`] };
  }
  return {
    ok: true,
    pending: { name: file.name, text, kind, header: [], guess: {}, hasLevels: positionsHaveLevels(data) },
  };
}

/** Runs the import on the current project's cases, soils and design; the route is replaced. */
export async function runImport(p: PendingImport, c: ImportChoices, current: Project): Promise<ImportResult> {
  const ex = await loadExchange();
  const { nodes: _n, pipes: _p, georeference: _g, ...rest } = current;
  const options = {
    tolerance: c.tolerance,
    levels: c.levels,
    cover: c.cover,
    name: p.name.replace(/\.[^.]*$/, '').slice(0, 200),
  };
  if (p.kind === 'geojson') return ex.importGeoJson(p.text, options, rest);
  return ex.importCsv(p.text, c.mapping!, c.unit, options, rest);
}

/** Reads any file the user opens or drops: a project opens at once, a route goes to the dialog. */
export async function readAnyFile(
  file: File,
): Promise<{ kind: 'project' } | { kind: 'route'; pending: PendingImport } | { kind: 'error'; lines: string[] }> {
  if (!/\.(csv|txt|geojson|json)$/i.test(file.name) && file.type !== 'application/json') return { kind: 'project' };
  if (file.size > MAX_FILE_BYTES)
    return {
      kind: 'error',
      lines: [`${file.name}: the file is ${(file.size / 1048576).toFixed(1)} MB; files over 20 MB are refused`],
    };
  let text: string;
  try {
    text = (await file.text()).replace(/^\uFEFF/, '');
  } catch (e) {
    return { kind: 'error', lines: [`${file.name}: the file could not be read (${(e as Error).message})`] };
  }
  const kind = fileKind(file.name, text);
  if (kind === 'project') return { kind: 'project' };
  const r = await prepareImport(file, text, kind);
  return r.ok ? { kind: 'route', pending: r.pending } : { kind: 'error', lines: r.lines };
}
