import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { route } from '../../test/projectBuilder.js';

/**
 * Which trench wall a bearing block stands against (plan geometry, worked by hand): a block behind a
 * tee or wye bears on the side wall of the run's trench, and its face runs along that trench, so the
 * trench width does not limit it; a block at a dead end bears on the end wall of the pipe's trench,
 * across it, where the trench width does. DN200 (OD 0.222 m) branch on a DN300 run, 1.2 MPa, soft clay
 * (47.88 kPa): the bearing area SF·T/σ = 1.5 · 1.2e6 · π/4 · 0.222² / 47,880 = 1.455 m² needs a face
 * wider than the 0.926 m trench (OD 0.326 m + 2 × 0.3 m) at any height the 1.2 m cover allows.
 */
const branchRoute = (branchDeg: number) => {
  const r = (branchDeg * Math.PI) / 180;
  return route({
    pressure: 1.2e6,
    soils: [{ id: 'clay', bearing: 47_880, unitWeight: 17_000, frictionAngle: 0, cohesion: 15_000 }],
    nodes: [
      { id: 'a', x: -50, y: 0, cover: 1.2, end: 'tie-in' },
      { id: 't', x: 0, y: 0, cover: 1.2 },
      { id: 'b', x: 50, y: 0, cover: 1.2, end: 'tie-in' },
      { id: 'e', x: 40 * Math.cos(r), y: 40 * Math.sin(r), cover: 1.2 },
    ],
    pipes: [
      { from: 'a', to: 't', od: 0.326 },
      { from: 't', to: 'b', od: 0.326 },
      { from: 't', to: 'e', od: 0.222 },
    ],
  });
};

const codes = (f: { diagnostics: { code: string }[] }) => f.diagnostics.map((d) => d.code);

describe('bearing face against a trench wall', () => {
  for (const deg of [90, 45]) {
    it(`a block behind a ${deg}° branch bears on the run's side wall: no trench-width limit or warning`, () => {
      const a = analyse(branchRoute(deg));
      const tee = a.byNode.get('t')!;
      const block = tee.restraint.block!;
      expect(block.faceWidth * block.faceHeight).toBeGreaterThanOrEqual(1.455);
      expect(codes(tee)).not.toContain('block.wider-than-trench');
    });
  }

  it('a block at the dead end of the same branch stands across its trench and is warned', () => {
    const end = analyse(branchRoute(90)).byNode.get('e')!;
    expect(end.restraint.block!.faceWidth).toBeGreaterThan(0.222 + 0.6);
    expect(codes(end)).toContain('block.wider-than-trench');
  });
});
