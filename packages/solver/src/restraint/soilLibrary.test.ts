import { describe, it, expect } from 'vitest';
import { SOIL_LIBRARY, findLibrarySoil } from './soilLibrary.js';
import { FOOT, PSF } from '../units/conversions.js';
import { soilSchema } from '../model/projectSchema.js';
import { expectClose } from '../../test/tolerance.js';

describe('the built-in soil library', () => {
  it('holds the seven horizontal bearing strengths, muck 0 to hard clay 9,000 psf (domain reference §4.2)', () => {
    const rows = SOIL_LIBRARY.filter((s) => s.family === 'horizontal-bearing').map((s) => Math.round(s.bearing / PSF));
    expect(rows).toEqual([0, 1000, 1500, 3000, 4000, 6000, 9000]);
  });

  it('gives IBC class 4 sand 600 psf at 4 ft, class 5 400 psf, class 3 800 psf (CV-21, IBC 2012 Table 1806.2)', () => {
    const at4ft = (id: string) => (findLibrarySoil(id)!.bearingPerDepth! * 4 * FOOT) / PSF;
    expectClose(at4ft('ibc-4-sand'), 600, 1e-12);
    expectClose(at4ft('ibc-5-clay-silt'), 400, 1e-12);
    expectClose(at4ft('ibc-3-gravel'), 800, 1e-12);
  });

  it('gives soils a project file accepts, so each can be copied into a project', () => {
    for (const { family: _family, ...soil } of SOIL_LIBRARY) expect(soilSchema.safeParse(soil).success).toBe(true);
  });

  it('marks the PVC-literature loads valid only below 2 ft of cover, and names a source on every row', () => {
    for (const s of SOIL_LIBRARY.filter((r) => r.family === 'safe-bearing')) expectClose(s.minCover!, 0.6096, 1e-12);
    for (const s of SOIL_LIBRARY) expect(s.source.length).toBeGreaterThan(20);
    expect(new Set(SOIL_LIBRARY.map((s) => s.id)).size).toBe(SOIL_LIBRARY.length);
  });
});
