import { describe, it, expect } from 'vitest';
import { route } from '../../test/projectBuilder.js';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from './scheduleOf.js';
import { takeOff } from './quantities.js';
import { restrainedJointCount } from './restrainedJoints.js';
import { restrainedStretches, stretchJoints } from './restrainedStretches.js';

const DN = 0.326;
const zone = (node: string, ...legs: [string, number][]) => ({
  node,
  restraint: { restrainedLegs: legs.map(([pipe, length]) => ({ pipe, length })) },
});
const total = (m: Map<string, number>) => [...m.values()].reduce((a, b) => a + b, 0);

describe('restrained pipe counted once where zones overlap', () => {
  // A dead end, a 90° bend and a dead end: 100 m east, then 80 m north.
  const elbow = route({
    nodes: [
      { id: 'a', x: 0, y: 0 },
      { id: 'b', x: 100, y: 0 },
      { id: 'c', x: 100, y: 80 },
    ],
    pipes: [
      { from: 'a', to: 'b', od: DN },
      { from: 'b', to: 'c', od: DN },
    ],
  });

  it('zones that cover the whole line restrain each pipe once: 180 m, not 540', () => {
    // Each dead end restrained 180 m (the whole line), the bend 100 m and 80 m: the rows add 540 m.
    const s = restrainedStretches(elbow, [
      zone('a', ['p1', 180]),
      zone('b', ['p1', 100], ['p2', 80]),
      zone('c', ['p2', 180]),
    ]);
    expect(s.reduce((v, x) => v + (x.end - x.start), 0)).toBeCloseTo(180, 9);
    // Hand count with 6 m pipes: 100 m laid from a, joints at a, 6, 12 … 96 (⌈100/6⌉ − 1 = 16 between)
    // and at the bend's socket; 80 m laid from the bend, its socket, 13 between, and c: 18 + 15.
    const joints = stretchJoints(elbow, s, 6);
    expect(joints.get('p1')).toBe(18);
    expect(joints.get('p2')).toBe(15);
  });

  it('one zone inside one pipe counts as its row does', () => {
    const s = restrainedStretches(elbow, [zone('b', ['p2', 6.2])]);
    expect(s).toEqual([{ pipe: 'p2', start: 0, end: 6.2, pipeLength: 80 }]);
    expect(total(stretchJoints(elbow, s, 6))).toBe(restrainedJointCount(6.2, 6));
    // and the bend's two legs, one each side: 2 + 2 joints (two sockets at the bend)
    const both = restrainedStretches(elbow, [zone('b', ['p1', 6.2], ['p2', 6.2])]);
    expect(total(stretchJoints(elbow, both, 6))).toBe(4);
  });

  it('runs on through a straight joint, where two pipe ends make one joint', () => {
    const straight = route({
      nodes: [
        { id: 'a', x: 0, y: 0 },
        { id: 'm', x: 50, y: 0 },
        { id: 'b', x: 100, y: 0 },
      ],
      pipes: [
        { from: 'a', to: 'm', od: DN },
        { from: 'm', to: 'b', od: DN },
      ],
    });
    const s = restrainedStretches(straight, [zone('a', ['p1', 70])]);
    expect(s.map((x) => [x.pipe, x.start, x.end])).toEqual([
      ['p1', 0, 50],
      ['p2', 0, 20],
    ]);
    // Laid from a: joints at 0, 6 … 48 (9), the joint at m (50), then 56, 62, 68 (3): 13.
    expect(total(stretchJoints(straight, s, 6))).toBe(13);
  });

  it('runs on past a tie-in into the existing main', () => {
    const tieIn = route({
      nodes: [
        { id: 'a', x: 0, y: 0, end: 'tie-in' },
        { id: 'b', x: 30, y: 0 },
      ],
      pipes: [{ from: 'a', to: 'b', od: DN }],
    });
    const s = restrainedStretches(tieIn, [zone('b', ['p1', 50])]);
    expect(s).toEqual([{ pipe: 'p1', start: -20, end: 30, pipeLength: 30 }]);
    // 50 m from the cap, the first joint at it: as one leg, ⌈50/6⌉ = 9 (the tie-in's joint among them).
    expect(total(stretchJoints(tieIn, s, 6))).toBe(restrainedJointCount(50, 6));
  });

  it('the take-off of a short line held by restrained joints lists no more pipe than the line has', () => {
    // Every fitting held by restrained joints at a high test pressure: the zones of the two dead ends and
    // the bend overlap, so the rows' lengths add to more than the line.
    const held = route({
      pressure: 3e6,
      nodes: [
        { id: 'a', x: 0, y: 0, restraint: 'joints' },
        { id: 'b', x: 40, y: 0, restraint: 'joints' },
        { id: 'c', x: 40, y: 30, restraint: 'joints' },
      ],
      pipes: [
        { from: 'a', to: 'b', od: 0.66 },
        { from: 'b', to: 'c', od: 0.66 },
      ],
    });
    const rows = scheduleOf(analyse(held)).fittings;
    const rowsLength = rows.flatMap((f) => f.restraint.restrainedLegs).reduce((v, l) => v + l.length, 0);
    expect(rowsLength).toBeGreaterThan(70);
    const t = takeOff(rows, held, 'si');
    expect(t.joints.reduce((v, j) => v + j.length, 0)).toBeLessThanOrEqual(70 + 1e-9);
  });
});
