import { describe, it, expect } from 'vitest';
import { SOIL_KINDS, SOIL_LIBRARY, findLibrarySoil, librarySoilToProject, orderingBearing } from './soilLibrary.js';
import { FOOT, PSF } from '../units/conversions.js';
import { soilSchema } from '../model/projectSchema.js';
import { expectClose } from '../../test/tolerance.js';

const psfOf = (id: string) => Math.round(findLibrarySoil(id)!.bearing / PSF);

describe('the built-in soil library', () => {
  it('keeps the seven horizontal bearing strengths of the ductile-iron manual, muck 0 to hard clay 9,000 psf (DIPRA, Thrust Restraint Design for Ductile Iron Pipe)', () => {
    const rows = SOIL_LIBRARY.filter((s) => s.table === 'bearing-table');
    expect(Object.fromEntries(rows.map((s) => [s.tableRow, Math.round(s.bearing / PSF)]))).toEqual({
      Muck: 0,
      'Soft clay': 1000,
      Silt: 1500,
      'Sandy silt': 3000,
      Sand: 4000,
      'Sandy clay': 6000,
      'Hard clay': 9000,
    });
  });

  it('keeps the safe-bearing list values, muck 0 to hard shale 10,000 psf, and says they are common practice, not AWWA M23', () => {
    const rows = SOIL_LIBRARY.filter((s) => s.table === 'common-practice');
    expect(Object.fromEntries(rows.map((s) => [s.tableRow, Math.round(s.bearing / PSF)]))).toEqual({
      'Muck, peat': 0,
      'Soft clay': 1000,
      Sand: 2000,
      'Sand and gravel': 3000,
      'Sand and gravel cemented with clay': 4000,
      'Hard shale': 10000,
    });
    for (const s of rows) {
      expect(s.sourceShort).toBe('common practice');
      expect(s.source).toMatch(/^Common practice/);
      expect(s.source).toMatch(/AWWA M23 does not contain it/);
      expectClose(s.minCover!, 2 * FOOT, 1e-12); // valid for more than 2 ft of cover
    }
  });

  it('gives IBC class 4 sand 600 psf at 4 ft, class 5 400 psf, class 3 800 psf (IBC 2012 Table 1806.2: 150, 100, 200 psf/ft)', () => {
    const at4ft = (id: string) => (findLibrarySoil(id)!.bearingPerDepth! * 4 * FOOT) / PSF;
    expectClose(at4ft('sand-ibc4'), 600, 1e-12);
    expectClose(at4ft('clay-silt-ibc5'), 400, 1e-12);
    expectClose(at4ft('gravel-ibc3'), 800, 1e-12);
    expectClose(findLibrarySoil('rock-crystalline-ibc1')!.verticalBearing! / PSF, 12000, 1e-9);
  });

  it('groups the classes by kind in the order cohesionless, cohesive, organic, rock, each ordered by bearing', () => {
    const kinds = SOIL_KINDS.map((k) => k.kind);
    expect(kinds).toEqual(['cohesionless', 'cohesive', 'organic', 'rock']);
    const seen = SOIL_LIBRARY.map((s) => kinds.indexOf(s.kind));
    expect(seen).toEqual([...seen].sort((a, b) => a - b));
    for (const kind of kinds) {
      const bearings = SOIL_LIBRARY.filter((s) => s.kind === kind).map(orderingBearing);
      expect(bearings.length).toBeGreaterThan(1);
      expect(bearings).toEqual([...bearings].sort((a, b) => a - b));
    }
    expect(SOIL_LIBRARY.filter((s) => s.kind === 'organic').every((s) => s.bearing === 0)).toBe(true);
    expect(psfOf('clay-hard')).toBeGreaterThan(psfOf('clay-soft'));
  });

  it('names each class its own way and cites the source row it came from', () => {
    for (const s of SOIL_LIBRARY) {
      expect(s.source).toContain(`row "${s.tableRow}"`);
      expect(s.source).toContain('typical values (common practice)');
      expect(s.sourceShort.length).toBeGreaterThan(5);
    }
    expect(new Set(SOIL_LIBRARY.map((s) => s.id)).size).toBe(SOIL_LIBRARY.length);
    // Two classes may share a name only when their sources differ, so the source beside tells them apart.
    const byName = new Map<string, string[]>();
    for (const s of SOIL_LIBRARY) byName.set(s.label!, [...(byName.get(s.label!) ?? []), s.sourceShort]);
    for (const sources of byName.values()) expect(new Set(sources).size).toBe(sources.length);
  });

  it('copies a class into a project as plain soil values that a project file accepts', () => {
    for (const s of SOIL_LIBRARY) {
      const soil = librarySoilToProject(s, `copy-${s.id}`);
      expect(soilSchema.safeParse(soil).success).toBe(true);
      expect(soil).not.toHaveProperty('kind');
      expect(soil).not.toHaveProperty('tableRow');
      expect(soil.bearing).toBe(s.bearing);
      expect(soil.source).toBe(s.source);
    }
  });
});
