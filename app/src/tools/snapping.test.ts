import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { signedTurn, snapSegment, STANDARD_DEFLECTIONS } from './snapping.js';
import { expectClose } from '../testFixtures.js';

const rad = (d: number) => (d * Math.PI) / 180;
const EAST = { x: 1, y: 0 };
const FROM = { x: 12, y: -7 };
/** The raw pointer `length` m from FROM at `turn` degrees left of east. */
const rawAt = (turn: number, length: number) => ({
  x: FROM.x + length * Math.cos(rad(turn)),
  y: FROM.y + length * Math.sin(rad(turn)),
});
const turnOf = (p: { x: number; y: number }) => signedTurn(EAST, { x: p.x - FROM.x, y: p.y - FROM.y });
const lengthOf = (p: { x: number; y: number }) => Math.hypot(p.x - FROM.x, p.y - FROM.y);

describe('signedTurn', () => {
  it('is +90° for a left turn, −90° for a right turn and 180° for a reversal (counter-clockwise positive)', () => {
    expectClose(signedTurn(EAST, { x: 0, y: 3 }), 90);
    expectClose(signedTurn(EAST, { x: 0, y: -3 }), -90);
    expectClose(signedTurn(EAST, { x: -2, y: 0 }), 180);
  });
});

describe('snapSegment after a previous segment: turns snap to the standard bends', () => {
  // Standard fitting deflections 11¼°, 22½°, 45°, 90° (AWWA C110/C153 bends, from memory); 0° is straight on.
  it.each([
    [4, 0],
    [9, 11.25],
    [-14, -11.25],
    [20, 22.5],
    [-40, -45],
    [58, 45],
    [-80, -90],
    [99, 90],
  ])('a raw turn of %s° becomes %s°, keeping its side', (raw, snapped) => {
    expectClose(turnOf(snapSegment(FROM, EAST, rawAt(raw, 20), 1)), snapped, 1e-9);
  });

  it('leaves a turn beyond 100° free: a raw 101° or −135° turn is kept as drawn', () => {
    expectClose(turnOf(snapSegment(FROM, EAST, rawAt(101, 20), 1)), 101, 1e-9);
    expectClose(turnOf(snapSegment(FROM, EAST, rawAt(-135, 20), 1)), -135, 1e-9);
  });

  it('lands every snapped turn on a standard bend, for any previous direction (invariant)', () => {
    const dir = fc.double({ min: -180, max: 180, noNaN: true });
    fc.assert(
      fc.property(
        dir,
        fc.double({ min: -99.9, max: 99.9, noNaN: true }),
        fc.double({ min: 0.5, max: 500, noNaN: true }),
        (bearing, turn, length) => {
          const previous = { x: Math.cos(rad(bearing)), y: Math.sin(rad(bearing)) };
          const raw = {
            x: FROM.x + length * Math.cos(rad(bearing + turn)),
            y: FROM.y + length * Math.sin(rad(bearing + turn)),
          };
          const out = snapSegment(FROM, previous, raw, 1);
          const snapped = Math.abs(signedTurn(previous, { x: out.x - FROM.x, y: out.y - FROM.y }));
          expect(STANDARD_DEFLECTIONS.some((d) => Math.abs(snapped - d) < 1e-6)).toBe(true);
        },
      ),
      { seed: 11225, numRuns: 300 },
    );
  });
});

describe('snapSegment lengths', () => {
  it('rounds the length to whole steps: 20.4 m → 20 m with a 1 m step, 12.6 m → 15 m with a 5 m step', () => {
    expectClose(lengthOf(snapSegment(FROM, EAST, rawAt(0, 20.4), 1)), 20, 1e-9);
    expectClose(lengthOf(snapSegment(FROM, EAST, rawAt(0, 12.6), 5)), 15, 1e-9);
  });

  it('never shortens a segment below one step: 0.3 m drawn with a 1.524 m (5 ft) step gives 1.524 m', () => {
    expectClose(lengthOf(snapSegment(FROM, EAST, rawAt(30, 0.3), 1.524)), 1.524, 1e-9);
  });

  it('returns the pointer unchanged when it sits on the segment start (no direction to snap)', () => {
    expect(snapSegment(FROM, EAST, { ...FROM }, 1)).toEqual(FROM);
  });
});

describe('snapSegment for a first segment: bearings snap to 11¼° steps', () => {
  it.each([
    [50, 45],
    [17, 22.5],
    [-4, 0],
    [-100, -101.25],
    [173, 168.75],
  ])('a raw bearing of %s° becomes %s° (nearest multiple of 11.25°)', (raw, snapped) => {
    expectClose(turnOf(snapSegment(FROM, null, rawAt(raw, 20), 1)), snapped, 1e-9);
  });
});
