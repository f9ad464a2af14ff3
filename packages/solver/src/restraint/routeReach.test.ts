import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { lineAlong } from './routeReach.js';
import { route } from '../../test/projectBuilder.js';
import { expectClose } from '../../test/tolerance.js';

/**
 * A 90° bend at c held by restrained joints only, with 3 m of pipe one way (to a dead end) and 2 + 2.5 m
 * the other way (through a straight joint m to a dead end at b): at 2 MPa on a 0.5 m pipe the restrained
 * length (thrust ≈ 2·p·A·sin 45° ≈ 555 kN over a few kN/m of friction) far exceeds either.
 */
const short = route({
  pressure: 2e6,
  nodes: [
    { id: 'a', x: -3, y: 0 },
    { id: 'c', x: 0, y: 0, restraint: 'joints' },
    { id: 'm', x: 0, y: 2 },
    { id: 'b', x: 0, y: 4.5 },
  ],
  pipes: [
    { id: 'p1', from: 'a', to: 'c', od: 0.5 },
    { id: 'p2', from: 'c', to: 'm', od: 0.5 },
    { id: 'p3', from: 'm', to: 'b', od: 0.5 },
  ],
});

describe('restrained lengths capped at what the route holds', () => {
  it('measures the line from the fitting to the next branch or end, through straight joints (geometry)', () => {
    expectClose(lineAlong(short, 'c', 'p1').length, 3, 1e-12);
    expectClose(lineAlong(short, 'c', 'p2').length, 2 + 2.5, 1e-12);
  });

  it('cuts each restrained leg to its line and reports an error naming both lengths', () => {
    const f = analyse(short).byNode.get('c')!;
    const legs = new Map(f.restraint.restrainedLegs.map((l) => [l.pipe, l.length]));
    expectClose(legs.get('p1')!, 3, 1e-12);
    expectClose(legs.get('p2')!, 4.5, 1e-12);
    expect(f.restraint.restrainedLength).toBeCloseTo(4.5, 12);
    const capped = f.diagnostics.filter((d) => d.code === 'joints.longer-than-route');
    expect(capped.map((d) => d.subject.pipe).sort()).toEqual(['p1', 'p2']);
    for (const d of capped) {
      expect(d.severity).toBe('error');
      expect(d.values.length).toBeGreaterThan(d.values.reach!);
    }
  });

  it('ends toward a tie-in at the tie-in, saying the line runs on into the existing main', () => {
    const tied = route({
      pressure: 1e6,
      nodes: [
        { id: 'a', x: 0, y: 0, end: 'tie-in' },
        { id: 'b', x: 20, y: 0 },
      ],
      pipes: [{ id: 'p1', from: 'a', to: 'b', od: 0.3 }],
    });
    expect(lineAlong(tied, 'b', 'p1')).toEqual({ length: 20, tieIn: true });
    expect(lineAlong(short, 'c', 'p1').tieIn).toBe(false);
  });

  it('stops at a loop instead of walking round it', () => {
    const ring = route({
      pressure: 1e6,
      nodes: [
        { id: 'a', x: 0, y: 0 },
        { id: 'b', x: 10, y: 0 },
        { id: 'c', x: 10, y: 10 },
        { id: 'd', x: 0, y: 10 },
      ],
      pipes: [
        { id: 'p1', from: 'a', to: 'b', od: 0.3 },
        { id: 'p2', from: 'b', to: 'c', od: 0.3 },
        { id: 'p3', from: 'c', to: 'd', od: 0.3 },
        { id: 'p4', from: 'd', to: 'a', od: 0.3 },
      ],
    });
    expectClose(lineAlong(ring, 'a', 'p1').length, 40, 1e-12);
  });
});

describe('a restrained zone that runs past a tie-in', () => {
  it('is not cut there, and says how far it runs into the existing main', () => {
    // The same fitting with its 3 m leg ending at a tie-in: the existing main goes on beyond it.
    const tied = { ...short, nodes: short.nodes.map((n) => (n.id === 'a' ? { ...n, end: 'tie-in' as const } : n)) };
    const f = analyse(tied).byNode.get('c')!;
    const along = f.restraint.restrainedLegs.find((l) => l.pipe === 'p1')!;
    expect(along.length).toBeGreaterThan(3);
    const into = f.diagnostics.filter((d) => d.code === 'joints.into-existing-main');
    expect(into.map((d) => d.subject.pipe)).toEqual(['p1']);
    expectClose(into[0]!.values.reach!, 3, 1e-12);
    expectClose(into[0]!.values.beyond!, along.length - 3, 1e-12);
    // cut only on its other leg, which ends at a dead end
    const cut = f.diagnostics.filter((d) => d.code === 'joints.longer-than-route');
    expect(cut.map((d) => d.subject.pipe)).toEqual(['p2']);
  });
});
