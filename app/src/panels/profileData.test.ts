import { describe, expect, it } from 'vitest';
import { analyse } from '@mainbrace/solver';
import { profileData } from './profileData.js';
import { expectClose, project } from '../testFixtures.js';

/**
 * Main line Kestrel Hill: tie-in n1 → n2 → n3 → n4 (110 m along), with a 25 m branch n2 → n5 of a
 * smaller pipe. Elevations and covers differ per node so a swapped field cannot pass.
 */
function withBranch() {
  return project(
    [
      { id: 'n1', x: 0, y: 0, z: 101.2, cover: 1.1, end: 'tie-in' },
      { id: 'n2', x: 30, y: 0, z: 98.5, cover: 1.35 },
      { id: 'n3', x: 30, y: 40, z: 97.25, cover: 1.6 },
      { id: 'n4', x: 70, y: 40, z: 99.0, cover: 1.45 },
      { id: 'n5', x: 30, y: -25, z: 98.0, cover: 1.2 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
      { from: 'n3', to: 'n4' },
      { from: 'n2', to: 'n5', od: 0.17 },
    ],
    [
      { id: 'working', label: 'Working', pressure: 600e3, datumElevation: 95 },
      { id: 'test', pressure: 1.0e6, datumElevation: 92.5 },
      { id: 'flat', pressure: 400e3 },
    ],
  );
}

describe('profileData path', () => {
  it('follows the main line from the tie-in to the farthest node and leaves the branch out', () => {
    const doc = withBranch();
    const { points } = profileData(doc, analyse(doc));
    expect(points.map((p) => p.node)).toEqual(['n1', 'n2', 'n3', 'n4']);
  });

  it('measures chainage along the pipes in 3-D (hand calculation: √(30² + 2.7²) for the first pipe)', () => {
    const doc = withBranch();
    const { points } = profileData(doc, analyse(doc));
    const first = Math.hypot(30, 101.2 - 98.5);
    expectClose(points[0]!.chainage, 0);
    expectClose(points[1]!.chainage, first, 1e-9);
    expectClose(points[3]!.chainage, first + Math.hypot(40, 1.25) + Math.hypot(40, 1.75), 1e-9);
  });
});

describe('profileData main line beside a branch as long as the main before its tee', () => {
  // Main m1 → m2 (tee) → m3, 60 m each way along x; a 30 m branch from the tee: the branch node's own
  // chainage (30 m along run B) plus its pipe (30 m) equals the tee's chainage on the main (60 m).
  const doc = () =>
    project(
      [
        { id: 'm1', x: 0, y: 0, z: 100, cover: 1.2, end: 'tie-in' },
        { id: 'm2', x: 60, y: 0, z: 100, cover: 1.2 },
        { id: 'm3', x: 120, y: 0, z: 100, cover: 1.2 },
        { id: 'b1', x: 60, y: -30, z: 100, cover: 1.2 },
        { id: 'b2', x: 60, y: -60, z: 100, cover: 1.2 },
      ],
      [
        { from: 'm1', to: 'm2' },
        { from: 'm2', to: 'm3' },
        { from: 'm2', to: 'b1' },
        { from: 'b1', to: 'b2' },
      ],
      [{ id: 'working', label: 'Working', pressure: 600e3, datumElevation: 95 }],
    );

  it('runs from the main’s start through the tee to its end, the branch drawn from the tee', () => {
    const d = doc();
    const { points, branches } = profileData(d, analyse(d));
    expect(points.map((p) => p.node)).toEqual(['m1', 'm2', 'm3']);
    expect(points.map((p) => p.chainage)).toEqual([0, 60, 120]);
    // the branch continues from the tee's chainage: 60 + 30, 60 + 60 (hand calculation)
    expect(branches).toHaveLength(1);
    expect(branches[0]!.points.map((p) => [p.node, p.chainage])).toEqual([
      ['m2', 60],
      ['b1', 90],
      ['b2', 120],
    ]);
  });
});

describe('profileData levels', () => {
  it('puts the ground at centreline + OD/2 + cover, with the largest OD at the node (hand calculation)', () => {
    const doc = withBranch();
    const { points } = profileData(doc, analyse(doc));
    expect(points.map((p) => p.pipe)).toEqual([101.2, 98.5, 97.25, 99.0]);
    // n2 meets DN300 (OD 0.326 m) and the 0.17 m branch: the larger one sets the ground.
    expectClose(points[1]!.ground, 98.5 + 0.326 / 2 + 1.35, 1e-12);
    expectClose(points[3]!.ground, 99.0 + 0.163 + 1.45, 1e-12);
  });

  it('gives each case with a datum its static grade datum + p/(ρ·g), with ρ = 998.2 kg/m³ and g = 9.80665 m/s² (hand calculation)', () => {
    const doc = withBranch();
    const { grades } = profileData(doc, analyse(doc));
    // 600 000 / (998.2 × 9.80665) = 61.2933 m; 1 000 000 / 9789.0 = 102.1555 m (CV-19 uses the same ρ·g).
    expect(grades.map((g) => [g.caseId, g.label])).toEqual([
      ['working', 'Working'],
      ['test', 'test'],
    ]);
    expectClose(grades[0]!.elevation, 95 + 61.2933, 1e-4);
    expectClose(grades[1]!.elevation, 92.5 + 102.1555, 1e-4);
  });

  it('marks the fittings on the path and leaves plain points unmarked', () => {
    const doc = withBranch();
    const a = analyse(doc);
    const { points } = profileData(doc, a);
    expect(points[0]!.mark).toBeNull(); // a tie-in is not a fitting to restrain
    expect(points[1]!.mark).toBe(a.byNode.get('n2')!.mark);
  });
});

describe('profileData long section', () => {
  it('marks a crest where the grade turns down and a sag where it turns up (hand calculation)', () => {
    // Up 2 m over 50 m, down 2 m over 50 m, down 1 m over 40 m, up 3 m over 60 m: slopes +2.29°, −2.29°,
    // −1.43°, +2.86°; turns −4.58° (crest), +0.86° (sag, above the 0.5° straight-joint tolerance), +4.29° (sag).
    const doc = project(
      [
        { id: 'a', x: 0, y: 0, z: 100 },
        { id: 'b', x: 50, y: 0, z: 102 },
        { id: 'c', x: 100, y: 0, z: 100 },
        { id: 'd', x: 140, y: 0, z: 99 },
        { id: 'e', x: 200, y: 0, z: 102 },
      ],
      [
        { from: 'a', to: 'b' },
        { from: 'b', to: 'c' },
        { from: 'c', to: 'd' },
        { from: 'd', to: 'e' },
      ],
    );
    const { points } = profileData(doc, analyse(doc));
    expect(points.map((p) => p.bend)).toEqual([null, 'crest', 'sag', 'sag', null]);
  });

  it('draws a branch from its tee, its chainage going on from the tee’s', () => {
    const doc = withBranch();
    const { points, branches } = profileData(doc, analyse(doc));
    expect(branches).toHaveLength(1);
    const b = branches[0]!;
    expect(b.from).toBe('n2');
    expect(b.points.map((p) => p.node)).toEqual(['n2', 'n5']);
    expectClose(b.points[0]!.chainage, points[1]!.chainage, 1e-12);
    expectClose(b.points[1]!.chainage, points[1]!.chainage + Math.hypot(25, 0.5), 1e-9);
  });

  it('carries the design groundwater level', () => {
    const doc = { ...withBranch(), design: { ...withBranch().design, groundwaterElevation: 97.8 } };
    expect(profileData(doc, analyse(doc)).groundwater).toBe(97.8);
  });
});
