import { describe, expect, it } from 'vitest';
import { typedPoint, typedStep } from './typedPoint.js';
import { NO_HIT } from './hit.js';
import type { DrawState } from './drawTool.js';
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
  it('with the pointer on the last node, a bare length goes straight on: 4 m after a leg heading north-east', () => {
    // previous leg (3, 3): unit (0.707107, 0.707107); 4 m on from (3, 3) → (5.828427, 5.828427)
    const p = at(typedPoint(step(4, { kind: 'pointer' }), { x: 3, y: 3 }, { x: 3, y: 3 }, { x: 3, y: 3 }));
    expect(p.x).toBeCloseTo(3 + 4 / Math.SQRT2, 12);
    expect(p.y).toBeCloseTo(3 + 4 / Math.SQRT2, 12);
  });

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

describe('typed entries as steps of the draw tool', () => {
  const none = () => NO_HIT;
  it('coordinates start a run; a length and a turn place the next nodes exactly, unsnapped', () => {
    let state: DrawState = { phase: 'idle' };
    const r1 = typedStep(state, { kind: 'point', x: 100, y: 200 }, none);
    if (!r1.ok) throw new Error(r1.message);
    state = r1.state;
    expect(state).toMatchObject({ phase: 'drawing', startPoint: { x: 100, y: 200 } });
    // 12.34 m due east (bearing 90°): (112.34, 200); snapping to whole metres would have given 112
    const r2 = typedStep(state, step(12.34, { kind: 'bearing', degrees: 90 }), none);
    if (!r2.ok) throw new Error(r2.message);
    state = r2.state;
    const v = state.phase === 'drawing' ? state.vertices[0]! : null;
    expect(v?.x).toBeCloseTo(112.34, 12);
    expect(v?.y).toBeCloseTo(200, 12);
    // then 5 m turning 90° left: north, to (112.34, 205)
    const r3 = typedStep(state, step(5, { kind: 'deflection', degrees: 90 }), none);
    if (!r3.ok) throw new Error(r3.message);
    const w = r3.state.phase === 'drawing' ? r3.state.vertices[1]! : null;
    expect(w?.x).toBeCloseTo(112.34, 12);
    expect(w?.y).toBeCloseTo(205, 12);
  });

  it('a typed point on an existing node ends the run there', () => {
    const state: DrawState = {
      phase: 'drawing',
      start: { kind: 'point', at: { x: 0, y: 0 } },
      startPoint: { x: 0, y: 0 },
      vertices: [],
      cursor: null,
    };
    const r = typedStep(state, { kind: 'point', x: 10, y: 0 }, () => ({ kind: 'node', id: 'n7', at: { x: 10, y: 0 } }));
    expect(r).toMatchObject({ ok: true, state: { phase: 'idle' }, commit: { end: { kind: 'node', id: 'n7' } } });
  });

  it('a length before the run has started is refused with what to do', () => {
    expect(typedStep({ phase: 'idle' }, step(5, { kind: 'pointer' }), none)).toEqual({
      ok: false,
      message: 'start the run first: click on the plan or type its coordinates (E 120 N 340)',
    });
  });
});
