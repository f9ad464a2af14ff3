import { extentMiddle, localTransverseMercator, scaleError, type PlanProjection } from './localProjection.js';
import { pipeChoice, type PipeChoice } from './pipeChoice.js';
import type { RouteLine, RoutePoint } from './routeNetwork.js';
import { pointText, type ImportNote } from './importNotes.js';

/** Runs read from a GeoJSON text (RFC 7946), projected to the local plane. */
export type GeoJsonRead =
  | { ok: true; lines: RouteLine[]; projection: PlanProjection; hasLevels: boolean; notes: ImportNote[] }
  | { ok: false; notes: ImportNote[] };

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);

/** One line string as found: where it is, its name and properties, its raw positions. */
interface RawLine {
  where: string;
  name: string;
  properties: Json;
  positions: unknown[];
  /** path of the positions array: `coordinates` or `coordinates[1]` */
  path: string;
}

/** A short name of a feature for messages: `features[2] "Elm Lane"`. */
function featureName(index: number | null, f: Json): string {
  const props = isObject(f.properties) ? f.properties : {};
  const label = props.name ?? props.Name ?? props.NAME ?? props.label ?? f.id ?? props.id;
  const base = index === null ? 'the geometry' : `features[${index}]`;
  return typeof label === 'string' || typeof label === 'number' ? `${base} "${String(label).slice(0, 60)}"` : base;
}

/** The properties a run may carry its pipe in, read loosely (any case; a few usual spellings). */
function pipeProps(props: Json): { series?: string; size?: string; material?: string } {
  const lower = new Map(Object.entries(props).map(([k, v]) => [k.toLowerCase(), v]));
  const pick = (...keys: string[]) => {
    for (const k of keys) {
      const v = lower.get(k);
      if (typeof v === 'string' && v.trim()) return v.trim();
      if (typeof v === 'number' && Number.isFinite(v)) return String(v);
    }
    return undefined;
  };
  const out: { series?: string; size?: string; material?: string } = {};
  const series = pick('series');
  const size = pick('size', 'nominal', 'dn', 'diameter', 'nominal_size');
  const material = pick('material', 'mat', 'pipe_material');
  if (series !== undefined) out.series = series;
  if (size !== undefined) out.size = size;
  if (material !== undefined) out.material = material;
  return out;
}

function collectLines(data: unknown, notes: ImportNote[]): RawLine[] {
  const lines: RawLine[] = [];
  const fromGeometry = (g: unknown, where: string, name: string, props: Json) => {
    if (g === null) {
      notes.push({ level: 'warning', where: name, message: 'has no geometry (null): nothing to import from it' });
      return;
    }
    if (!isObject(g) || typeof g.type !== 'string') {
      notes.push({ level: 'error', where: name, message: `${where}: expected a geometry object with a "type"` });
      return;
    }
    if (g.type === 'LineString') {
      if (!Array.isArray(g.coordinates))
        notes.push({ level: 'error', where: name, message: `${where}.coordinates: expected an array of positions` });
      else lines.push({ where, name, properties: props, positions: g.coordinates, path: 'coordinates' });
    } else if (g.type === 'MultiLineString') {
      if (!Array.isArray(g.coordinates)) {
        notes.push({ level: 'error', where: name, message: `${where}.coordinates: expected an array of line strings` });
        return;
      }
      g.coordinates.forEach((part, i) => {
        if (!Array.isArray(part))
          notes.push({ level: 'error', where: name, message: `coordinates[${i}]: expected an array of positions` });
        else
          lines.push({
            where,
            name: `${name} part ${i}`,
            properties: props,
            positions: part,
            path: `coordinates[${i}]`,
          });
      });
    } else if (g.type === 'GeometryCollection' && Array.isArray(g.geometries)) {
      g.geometries.forEach((sub, i) =>
        fromGeometry(sub, `${where}.geometries[${i}]`, `${name} geometries[${i}]`, props),
      );
    } else {
      notes.push({
        level: 'warning',
        where: name,
        message: `is a ${g.type}, not a LineString or MultiLineString: not a run, not imported`,
      });
    }
  };
  const fromFeature = (f: unknown, index: number | null) => {
    const name = index === null ? 'the feature' : `features[${index}]`;
    if (!isObject(f) || f.type !== 'Feature') {
      notes.push({ level: 'error', where: name, message: 'expected an object with "type": "Feature"' });
      return;
    }
    const fname = index === null ? featureName(null, f).replace('the geometry', 'the feature') : featureName(index, f);
    fromGeometry(f.geometry, 'geometry', fname, isObject(f.properties) ? f.properties : {});
  };
  if (!isObject(data) || typeof data.type !== 'string') {
    notes.push({ level: 'error', where: '', message: 'not GeoJSON: expected an object with a "type" member' });
    return lines;
  }
  if (isObject(data.crs)) {
    // RFC 7946 §4 drops "crs": coordinates are WGS 84 longitude/latitude. An older file may name another.
    const props = isObject(data.crs.properties) ? data.crs.properties : {};
    const named = String(props.name ?? '');
    if (!/CRS84|EPSG:{1,2}4326|EPSG::4326/i.test(named))
      notes.push({
        level: 'error',
        where: 'crs',
        message: `declares the coordinate system "${named || 'unnamed'}"; only WGS 84 longitude/latitude (RFC 7946) is read: export the file from the GIS as GeoJSON in EPSG:4326`,
      });
  }
  if (data.type === 'FeatureCollection') {
    if (!Array.isArray(data.features))
      notes.push({ level: 'error', where: 'features', message: 'expected an array of features' });
    else data.features.forEach((f, i) => fromFeature(f, i));
  } else if (data.type === 'Feature') fromFeature(data, null);
  else fromGeometry(data, 'geometry', 'the geometry', {});
  return lines;
}

/**
 * Reads the runs of a GeoJSON text. Every position is checked (two or three finite numbers, longitude
 * −180…180, latitude −90…90), and a bad one is named by feature and coordinate. Longitude/latitude are
 * projected to a local transverse Mercator about the middle of the routes (localProjection.ts).
 */
export function readGeoJsonRoute(text: string, fallbackPipe: PipeChoice): GeoJsonRead {
  const notes: ImportNote[] = [];
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, notes: [{ level: 'error', where: '', message: `not valid JSON: ${(e as Error).message}` }] };
  }
  const raws = collectLines(data, notes);
  type Pos = { lon: number; lat: number; z: number | null; where: string };
  const parsed: { raw: RawLine; positions: Pos[] }[] = [];
  let withZ = 0;
  let withoutZ: string | null = null;
  for (const raw of raws) {
    const positions: Pos[] = [];
    raw.positions.forEach((p, i) => {
      const at = `${raw.name}, ${raw.path}[${i}]`;
      const shown = Array.isArray(p) ? `[${p.map((v) => JSON.stringify(v)).join(', ')}]` : JSON.stringify(p);
      const bad = (message: string) => notes.push({ level: 'error', where: `${at} ${shown}`, message });
      if (!Array.isArray(p) || p.length < 2)
        return bad('expected a position [longitude, latitude] or [longitude, latitude, level]');
      const [lon, lat, z] = p as unknown[];
      if (typeof lon !== 'number' || !Number.isFinite(lon)) return bad('longitude must be a number');
      if (typeof lat !== 'number' || !Number.isFinite(lat)) return bad('latitude must be a number');
      if (Math.abs(lon) > 180 || Math.abs(lat) > 90)
        return bad(
          Math.abs(lon) > 1000 || Math.abs(lat) > 1000
            ? 'looks like projected coordinates (metres); GeoJSON (RFC 7946) holds WGS 84 longitude/latitude in degrees: export it from the GIS in EPSG:4326'
            : Math.abs(lon) > 180
              ? 'longitude must be between −180 and 180 degrees'
              : 'latitude must be between −90 and 90 degrees (is the order [longitude, latitude]?)',
        );
      if (p.length >= 3 && (typeof z !== 'number' || !Number.isFinite(z)))
        return bad('the third value (the level) must be a number');
      if (p.length >= 3) withZ++;
      else withoutZ ??= `${at} ${shown}`;
      positions.push({ lon, lat, z: p.length >= 3 ? (z as number) : null, where: `${at} ${shown}` });
    });
    parsed.push({ raw, positions });
  }
  if (withZ > 0 && withoutZ !== null)
    notes.push({
      level: 'error',
      where: withoutZ,
      message: 'has no level while other positions have one: give every position a level, or none',
    });
  if (notes.some((n) => n.level === 'error')) return { ok: false, notes };
  const all = parsed.flatMap((l) => l.positions.map((p) => [p.lon, p.lat] as const));
  if (all.length === 0)
    return {
      ok: false,
      notes: [
        ...notes,
        { level: 'error', where: '', message: 'no LineString or MultiLineString with positions: no route to import' },
      ],
    };
  const [lon0, lat0] = extentMiddle(all);
  if (Math.abs(lat0) > 84)
    return {
      ok: false,
      notes: [
        ...notes,
        {
          level: 'error',
          where: '',
          message: 'the route lies beyond 84° latitude, where this local plane is not offered',
        },
      ],
    };
  const projection = localTransverseMercator(lon0, lat0);
  const lines: RouteLine[] = parsed.map(({ raw, positions }) => {
    const { pipe, problem } = pipeChoice(pipeProps(raw.properties), fallbackPipe);
    if (problem) notes.push({ level: 'warning', where: raw.name, message: problem });
    const points: RoutePoint[] = positions.map((p) => {
      const [x, y] = projection.forward([p.lon, p.lat]);
      return { x, y, level: p.z, where: p.where };
    });
    return { name: raw.name, points, pipe };
  });
  notes.push({
    level: 'note',
    where: '',
    message: `longitude/latitude projected to a local transverse Mercator centred at ${pointText(lon0, lat0, true)} (metres east and north of it)`,
  });
  // Lengths on the plane grow with the square of the distance from its central meridian: beyond 1 in
  // 10⁴ (about 90 km) a chainage or a restrained length set out on the ground would be off by more
  // than 10 cm a kilometre.
  let far = 0;
  for (const l of lines) for (const p of l.points) far = Math.max(far, Math.abs(p.x));
  if (scaleError(far) > 1e-4)
    notes.push({
      level: 'warning',
      where: '',
      message: `the route reaches ${Math.round(far / 1000)} km east or west of the middle of its local plane, where lengths read ${(scaleError(far) * 1e4).toFixed(1)} in 10⁴ long: import it in parts less than about 180 km across, or from a CSV survey in its own grid`,
    });
  return { ok: true, lines, projection, hasLevels: withZ > 0, notes };
}
