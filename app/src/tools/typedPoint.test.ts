import { describe, expect, it } from 'vitest';
import { typedPoint } from './typedPoint.js';
import type { TypedEntry } from '../format/typedEntry.js';

const step = (length: number, direction: Extract<TypedEntry, { kind: 'step' }>['direction']): TypedEntry => ({
  kind: 'step',
  length,
  direction,
});
const at = (r: ReturnType<typeof typedPoint>) => {
  if (!r.ok) throw new Error(r.message);
  return r.at;
};

describe('where a typed entry puts the next node', () => {
  it('toward the pointer: 10 m toward (3, 4) from the origin lands on (6, 8) (a 3-4-5 triangle, doubled)', () => {
    const p = at(typedPoint(step(10, { kind: 'pointer' }), { x: 0, y: 0 }, null, { x: 3, y: 4 }));
    expect(p.x).toBeCloseTo(6, 12);
    expect(p.y).toBeCloseTo(8, 12);
  });

  it('a 90° left turn from a leg heading east heads north: 10 m from (5, 5) lands on (5, 15)', () => {
    const p = at(typedPoint(step(10, { kind: 'deflection', degrees: 90 }), { x: 5, y: 5 }, { x: 2, y: 0 }, null));
    expect(p.x).toBeCloseTo(5, 12);
    expect(p.y).toBeCloseTo(15, 12);
  });

  it('a 30° right turn from a leg heading north: 5 m gives (5 sin 30°, 5 cos 30°) = (2.5, 4.330127)', () => {
    const p = at(typedPoint(step(5, { kind: 'deflection', degrees: -30 }), { x: 0, y: 0 }, { x: 0, y: 7 }, null));
    expect(p.x).toBeCloseTo(2.5, 12);
    expect(p.y).toBeCloseTo(4.330127019, 9);
  });

  it('bearings clockwise from north: 90° is east, 225° is south-west (−7.071068, −7.071068 for 10 m)', () => {
    const east = at(typedPoint(step(12, { kind: 'bearing', degrees: 90 }), { x: 1, y: 1 }, null, null));
    expect(east.x).toBeCloseTo(13, 12);
    expect(east.y).toBeCloseTo(1, 12);
    const sw = at(typedPoint(step(10, { kind: 'bearing', degrees: 225 }), { x: 0, y: 0 }, null, null));
    expect(sw.x).toBeCloseTo(-7.0710678, 6);
    expect(sw.y).toBeCloseTo(-7.0710678, 6);
  });

  it('coordinates are the node itself, with or without a run started', () => {
    expect(typedPoint({ kind: 'point', x: 3, y: -4 }, null, null, null)).toEqual({ ok: true, at: { x: 3, y: -4 } });
  });

  it('says what is missing: a start, a previous leg for a turn, a direction for a bare length', () => {
    expect(typedPoint(step(5, { kind: 'pointer' }), null, null, null)).toMatchObject({ ok: false });
    expect(typedPoint(step(5, { kind: 'deflection', degrees: 10 }), { x: 0, y: 0 }, null, null)).toEqual({
      ok: false,
      message: 'a turn needs a previous leg: give a bearing for the first leg (12.5 @90)',
    });
    expect(typedPoint(step(5, { kind: 'pointer' }), { x: 0, y: 0 }, null, { x: 0, y: 0 })).toEqual({
      ok: false,
      message: 'point the pointer where the leg goes, or give a bearing (12.5 @90)',
    });
  });
});
