import { describe, it, expect } from 'vitest';
import { Geodesic } from 'geographiclib-geodesic';
import { importGeoJson } from './routeProject.js';
import { analyse } from '../analysis/analyse.js';
import { noteText } from './importNotes.js';
import { nodeCover } from '../model/groundLevel.js';

/**
 * Expected bends come from the geodesics between the file's own longitude/latitude points on the
 * WGS 84 ellipsoid, by GeographicLib (C. F. F. Karney, "Algorithms for geodesics", J. Geodesy 87,
 * 2013), which shares no code with the projection the import uses (proj4). At a vertex B between A and
 * C the line arrives with azimuth azi2 of A→B and leaves with azi1 of B→C; the bend is their difference.
 */
function geodesicBend(a: number[], b: number[], c: number[]): number {
  const arrive = Geodesic.WGS84.Inverse(a[1]!, a[0]!, b[1]!, b[0]!).azi2!;
  const leave = Geodesic.WGS84.Inverse(b[1]!, b[0]!, c[1]!, c[0]!).azi1!;
  const d = ((((leave - arrive) % 360) + 540) % 360) - 180;
  return Math.abs(d);
}

const line = (coordinates: number[][], properties: Record<string, unknown> = {}) => ({
  type: 'Feature',
  properties,
  geometry: { type: 'LineString', coordinates },
});
const collection = (...features: unknown[]) => JSON.stringify({ type: 'FeatureCollection', features });

// An invented main, "Quarry Hill Road", at about 47.4° N 8.5° E: legs of 90 to 400 m, bends of
// every size from a few degrees to more than a right angle.
const QUARRY_HILL = [
  [8.5, 47.4],
  [8.5031, 47.4012],
  [8.5072, 47.4015],
  [8.5089, 47.4041],
  [8.5081, 47.4068],
  [8.5121, 47.4069],
  [8.5135, 47.4061],
];

describe('a GeoJSON route', () => {
  it('becomes one connected network whose bends match the geodesic bends to 0.1°', () => {
    const r = importGeoJson(collection(line(QUARRY_HILL, { name: 'Quarry Hill Road' })));
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    const { project } = r;
    expect(project.nodes).toHaveLength(QUARRY_HILL.length);
    expect(project.pipes).toHaveLength(QUARRY_HILL.length - 1);
    const analysis = analyse(project);
    // Nodes are numbered in the order the file gives the points (routeNetwork.ts).
    for (let k = 1; k + 1 < QUARRY_HILL.length; k++) {
      const expected = geodesicBend(QUARRY_HILL[k - 1]!, QUARRY_HILL[k]!, QUARRY_HILL[k + 1]!);
      const f = analysis.byNode.get(`n${k + 1}`)!;
      expect(f.geometry.kind).toBe('bend');
      expect(Math.abs(f.geometry.deflection! - expected)).toBeLessThan(0.1);
    }
    expect(project.georeference?.proj4).toMatch(/^\+proj=tmerc /);
  });

  it('imports a route across the 180th meridian with its geodesic lengths and bend', () => {
    // An invented main on an equatorial atoll straddling ±180°: three points within 60 m. Expected
    // lengths and bend from GeographicLib geodesics (Karney 2013), which knows no antimeridian.
    const ATOLL = [
      [179.9997, 0.0002],
      [-179.9998, 0.0002],
      [-179.9998, 0.0006],
    ];
    const r = importGeoJson(collection(line(ATOLL, { name: 'Reef Road' })));
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    const [a, b, c] = r.project.nodes;
    const planLength = Math.hypot(b!.x - a!.x, b!.y - a!.y);
    const geodesic = Geodesic.WGS84.Inverse(0.0002, 179.9997, 0.0002, -179.9998).s12!;
    expect(Math.abs(planLength - geodesic)).toBeLessThan(0.01);
    expect(Math.hypot(c!.x - b!.x, c!.y - b!.y)).toBeCloseTo(
      Geodesic.WGS84.Inverse(0.0002, -179.9998, 0.0006, -179.9998).s12!,
      2,
    );
    const f = analyse(r.project).byNode.get('n2')!;
    expect(Math.abs(f.geometry.deflection! - geodesicBend(ATOLL[0]!, ATOLL[1]!, ATOLL[2]!))).toBeLessThan(0.1);
  });

  it('warns when a route reaches so far from its plane’s middle that lengths read 1 in 10⁴ long', () => {
    // A straight aqueduct of our own along the equator, 2.2° of longitude (about 245 km): its ends lie
    // some 122 km from the central meridian, where k − 1 ≈ x²/2R² = 1.8 in 10⁴ (Snyder 1987, eq. 8-11).
    const long = importGeoJson(
      collection(
        line(
          [
            [10, 0],
            [11.1, 0],
            [12.2, 0],
          ],
          { name: 'Long Aqueduct' },
        ),
      ),
    );
    if (!long.ok) throw new Error(long.notes.map(noteText).join('\n'));
    const warning = long.notes.map(noteText).find((n) => n.includes('in 10⁴ long'));
    expect(warning).toMatch(/reaches 12[23] km east or west .* 1\.[89] in 10⁴ long/);
    // A 60 km main (ends 30 km out: 1.1 in 10⁵) imports without it.
    const short = importGeoJson(
      collection(
        line(
          [
            [10, 0],
            [10.27, 0],
            [10.54, 0],
          ],
          { name: 'Short Main' },
        ),
      ),
    );
    expect(short.notes.map(noteText).some((n) => n.includes('in 10⁴ long'))).toBe(false);
  });

  it('keeps the plan bend with z as the ground level, the pipe at the cover below it', () => {
    const withZ = QUARRY_HILL.map(([lon, lat], i) => [lon!, lat!, 410 + i * 1.5]);
    const r = importGeoJson(collection(line(withZ)), { cover: 1.5 });
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    const analysis = analyse(r.project);
    for (let k = 1; k + 1 < withZ.length; k++) {
      const expected = geodesicBend(withZ[k - 1]!, withZ[k]!, withZ[k + 1]!);
      const f = analysis.byNode.get(`n${k + 1}`)!;
      expect(Math.abs(f.geometry.horizontalDeflection! - expected)).toBeLessThan(0.1);
    }
    // DN200 EN 545: OD 0.222 m, so the centreline lies 1.5 + 0.111 m below the ground.
    r.project.nodes.forEach((n, i) => {
      expect(n.groundLevel).toBeCloseTo(410 + i * 1.5, 9);
      expect(n.elevation).toBeCloseTo(410 + i * 1.5 - 1.611, 6);
      expect(nodeCover(n, 0.222)).toBeCloseTo(1.5, 6);
    });
  });

  it('joins shared ends into one node and a point on another run into a tee', () => {
    // A branch leaving the main at a right angle from a point 1 cm off the middle of its first leg,
    // and a second feature continuing from the main's end (its first point 2 cm from that end).
    const [a, b] = [QUARRY_HILL[0]!, QUARRY_HILL[1]!];
    const mid = [(a[0]! + b[0]!) / 2, (a[1]! + b[1]!) / 2];
    const dLon = b[0]! - a[0]!;
    const dLat = b[1]! - a[1]!;
    // Perpendicular on the ground: scale longitude by cos(latitude) (a plane approximation is enough to aim).
    const k = Math.cos((47.4 * Math.PI) / 180);
    const perp = [-dLat / k, dLon * k];
    const branch = [mid, [mid[0]! + perp[0]! * 0.5, mid[1]! + perp[1]! * 0.5]];
    const end = QUARRY_HILL[QUARRY_HILL.length - 1]!;
    const onward = [
      [end[0]! + 0.0000002, end[1]!],
      [end[0]! + 0.002, end[1]! - 0.001],
    ];
    const r = importGeoJson(
      collection(line(QUARRY_HILL, { name: 'Main' }), line(branch, { name: 'Spur' }), line(onward, { name: 'Onward' })),
    );
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    const analysis = analyse(r.project);
    const kinds = analysis.fittings.map((f) => f.geometry.kind);
    expect(kinds.filter((x) => x === 'tee')).toHaveLength(1);
    // One network: every node reachable from the first.
    const seen = new Set(['n1']);
    let grew = true;
    while (grew) {
      grew = false;
      for (const p of r.project.pipes)
        if (seen.has(p.from) !== seen.has(p.to)) {
          seen.add(p.from);
          seen.add(p.to);
          grew = true;
        }
    }
    expect(seen.size).toBe(r.project.nodes.length);
    expect(r.notes.map(noteText).join('\n')).toMatch(/"Spur".*joined to it as a tee/);
  });

  it('reports a run it could not join, and keeps it', () => {
    const apart = [
      [8.52, 47.41],
      [8.521, 47.411],
    ];
    const r = importGeoJson(collection(line(QUARRY_HILL), line(apart, { name: 'Far Lane' })));
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    expect(r.project.nodes).toHaveLength(QUARRY_HILL.length + 2);
    expect(r.notes.map(noteText).join('\n')).toMatch(/warning: features\[1\] "Far Lane".*not joined to the rest/);
  });

  it('takes pipe size and material from the properties, and names one it cannot match', () => {
    const r = importGeoJson(
      collection(
        line(QUARRY_HILL.slice(0, 3), { material: 'PVC', size: '12' }),
        line(QUARRY_HILL.slice(2), { size: 'DN 9999' }),
      ),
    );
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    expect(r.project.pipes[0]).toMatchObject({ material: 'pvc', nominal: '12' });
    expect(r.project.pipes.at(-1)).toMatchObject({ series: 'di-en545', nominal: 'DN200' });
    expect(r.notes.map(noteText).join('\n')).toMatch(/features\[1\]: size "DN 9999" is not in/);
  });

  it('names the feature and the coordinate of a bad position', () => {
    const bad = [...QUARRY_HILL.slice(0, 3), [208.5, 47.4]];
    const r = importGeoJson(collection(line(QUARRY_HILL), line(bad, { name: 'Elm Lane' })));
    expect(r.ok).toBe(false);
    expect(r.notes.map(noteText)).toContain(
      'error: features[1] "Elm Lane", coordinates[3] [208.5, 47.4]: longitude must be between −180 and 180 degrees',
    );
  });

  it('refuses projected coordinates and a foreign crs, and names what it expected', () => {
    const metres = collection(
      line(
        [
          [2600000, 1200000],
          [2600100, 1200000],
        ],
        { name: 'Grid' },
      ),
    );
    const r = importGeoJson(metres);
    expect(r.ok).toBe(false);
    expect(r.notes.map(noteText).join('\n')).toMatch(/features\[0\] "Grid", coordinates\[0\].*projected coordinates/);
    const crs = JSON.stringify({
      type: 'FeatureCollection',
      crs: { type: 'name', properties: { name: 'urn:ogc:def:crs:EPSG::2056' } },
      features: [line(QUARRY_HILL)],
    });
    const c = importGeoJson(crs);
    expect(c.ok).toBe(false);
    expect(c.notes.map(noteText).join('\n')).toMatch(/EPSG::2056.*only WGS 84/);
  });

  it('says a file is not GeoJSON, and which non-line features it leaves out', () => {
    expect(importGeoJson('{"type": 3}').ok).toBe(false);
    const r = importGeoJson(
      collection(line(QUARRY_HILL), {
        type: 'Feature',
        properties: { name: 'Hydrant 4' },
        geometry: { type: 'Point', coordinates: [8.5, 47.4] },
      }),
    );
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    expect(r.notes.map(noteText).join('\n')).toMatch(/features\[1\] "Hydrant 4": is a Point, not a LineString/);
  });
});
