import { describe, it, expect } from 'vitest';
import { Geodesic } from 'geographiclib-geodesic';
import { importGeoJson } from './routeProject.js';
import { designGeoJson } from './geojsonExport.js';
import { noteText } from './importNotes.js';

// An invented main, "Mill Pond Way", about 51.2° N 0.4° W.
const MILL_POND = [
  [-0.4, 51.2],
  [-0.3972, 51.2009],
  [-0.3951, 51.2031],
];
const file = JSON.stringify({
  type: 'Feature',
  properties: { name: 'Mill Pond Way' },
  geometry: { type: 'LineString', coordinates: MILL_POND },
});

type Feature = { geometry: { type: string; coordinates: number[] | number[][] }; properties: Record<string, unknown> };

function exported(joints = false) {
  const r = importGeoJson(file);
  if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
  const project = joints
    ? { ...r.project, nodes: r.project.nodes.map((n) => ({ ...n, restraint: 'joints' as const })) }
    : r.project;
  const e = designGeoJson(project);
  if (!e.ok) throw new Error(e.message);
  return JSON.parse(e.text) as { type: string; features: Feature[]; cautions: string[] };
}

describe('GeoJSON export', () => {
  it('puts the pipes back at the longitudes and latitudes they were imported from (under 1e-8°)', () => {
    const fc = exported();
    expect(fc.type).toBe('FeatureCollection');
    const pipes = fc.features.filter((f) => f.properties.layer === 'pipe');
    expect(pipes).toHaveLength(2);
    const first = pipes[0]!.geometry.coordinates as number[][];
    expect(first[0]![0]).toBeCloseTo(MILL_POND[0]![0]!, 8);
    expect(first[0]![1]).toBeCloseTo(MILL_POND[0]![1]!, 8);
    expect(first[1]![0]).toBeCloseTo(MILL_POND[1]![0]!, 8);
    expect(fc.cautions.length).toBeGreaterThan(0);
  });

  it('gives each fitting its mark and results, and each block its size', () => {
    const fc = exported();
    const fittings = fc.features.filter((f) => f.properties.layer === 'fitting');
    // Two dead ends and one bend.
    expect(fittings.map((f) => f.properties.kind).sort()).toEqual(['bend', 'dead-end', 'dead-end']);
    const bend = fittings.find((f) => f.properties.kind === 'bend')!;
    const arrive = Geodesic.WGS84.Inverse(MILL_POND[0]![1]!, MILL_POND[0]![0]!, MILL_POND[1]![1]!, MILL_POND[1]![0]!);
    const leave = Geodesic.WGS84.Inverse(MILL_POND[1]![1]!, MILL_POND[1]![0]!, MILL_POND[2]![1]!, MILL_POND[2]![0]!);
    expect(Math.abs((bend.properties.deflection_deg as number) - Math.abs(leave.azi1! - arrive.azi2!))).toBeLessThan(
      0.1,
    );
    expect(bend.properties.horizontalThrust_N).toBeGreaterThan(0);
    const blocks = fc.features.filter((f) => f.properties.layer === 'thrust-block');
    expect(blocks.length).toBeGreaterThanOrEqual(3);
    expect(blocks[0]!.properties).toMatchObject({ name: expect.stringMatching(/^A\d+ block$/) });
    expect(blocks[0]!.properties.concreteVolume_m3).toBeGreaterThan(0);
  });

  it('sets a block’s point half its thickness from the fitting centre, as the schedule sets it out', () => {
    // docs/project-format.md: the block's thickness runs from the fitting's centreline to the bearing
    // face, so its middle is thickness / 2 from the fitting (geodesic distance on the ground, 1 cm).
    const fc = exported();
    const fittings = fc.features.filter((f) => f.properties.layer === 'fitting');
    const blocks = fc.features.filter((f) => f.properties.layer === 'thrust-block');
    expect(blocks.length).toBeGreaterThan(0);
    for (const b of blocks) {
      const fit = fittings.find((f) => f.properties.mark === b.properties.mark)!;
      const [x1, y1] = fit.geometry.coordinates as number[];
      const [x2, y2] = b.geometry.coordinates as number[];
      const s = Geodesic.WGS84.Inverse(y1!, x1!, y2!, x2!).s12!;
      expect(s).toBeCloseTo((b.properties.thickness_m as number) / 2, 2);
    }
  });

  it('draws a restrained zone as long on the ground as its computed length (geodesic length, 1 cm)', () => {
    const fc = exported(true);
    const zones = fc.features.filter((f) => f.properties.layer === 'restrained-zone');
    expect(zones.length).toBeGreaterThan(0);
    const within = zones.filter((z) => !z.properties.beyondPipe);
    expect(within.length).toBeGreaterThan(0);
    for (const z of within) {
      const [a, b] = z.geometry.coordinates as number[][];
      const ground = Geodesic.WGS84.Inverse(a![1]!, a![0]!, b![1]!, b![0]!).s12!;
      const dz = b![2]! - a![2]!;
      expect(Math.hypot(ground, dz)).toBeCloseTo(z.properties.length_m as number, 2);
    }
  });

  it('refuses a project without a georeference, saying why', () => {
    const r = importGeoJson(file);
    if (!r.ok) throw new Error('import failed');
    const { georeference: _g, ...plain } = r.project;
    const e = designGeoJson(plain);
    expect(e.ok).toBe(false);
    if (!e.ok) expect(e.message).toMatch(/no georeference/);
  });
});
