import { describe, expect, it } from 'vitest';
import type { UnitSystem } from '@mainbrace/solver';
import { describeEntry, parseEntry, parseLength, type TypedEntry } from './typedEntry.js';
import { expectClose } from '../testFixtures.js';

/** Exact factors: 1 ft = 0.3048 m, 1 in = 0.0254 m (1959 international yard and pound). */
const FT = 0.3048;
const IN = 0.0254;

const entry = (text: string, units: UnitSystem = 'si'): TypedEntry => {
  const r = parseEntry(text, units);
  if (!r.ok) throw new Error(r.message);
  return r.entry;
};
const message = (text: string, units: UnitSystem = 'si') => {
  const r = parseEntry(text, units);
  return r.ok ? null : r.message;
};
const metres = (text: string, units: UnitSystem) => {
  const r = parseLength(text, units);
  if (!r.ok) throw new Error(r.message);
  return r.metres;
};

describe('lengths typed while drawing', () => {
  it('a bare number is in display units: 12.5 is 12.5 m in SI, 12.5 ft = 3.81 m in a US project', () => {
    expectClose(metres('12.5', 'si'), 12.5, 1e-12);
    expectClose(metres('12.5', 'us'), 12.5 * FT, 1e-12); // 3.81 m
  });

  it('feet and inches: 41\' 6" = 41.5 ft = 12.6492 m; 41 ft 6 in the same; 18 in = 0.4572 m', () => {
    expectClose(metres(`41' 6"`, 'us'), 41.5 * FT, 1e-12);
    expectClose(metres('41 ft 6 in', 'us'), 41.5 * FT, 1e-12);
    expectClose(metres('18 in', 'us'), 18 * IN, 1e-12);
  });

  it('an explicit unit wins over the display units: 30 m in a US project, 30 ft in an SI one', () => {
    expectClose(metres('30 m', 'us'), 30, 1e-12);
    expectClose(metres('30ft', 'si'), 30 * FT, 1e-12); // 9.144 m
  });

  it('commas as parseTyped reads them: 1,250 m is 1250 m, 12,5 m is 12.5 m', () => {
    expectClose(metres('1,250 m', 'si'), 1250, 1e-12);
    expectClose(metres('12,5 m', 'si'), 12.5, 1e-12);
  });
});

describe('directions typed while drawing', () => {
  it('a length alone goes toward the pointer', () => {
    expect(entry('12.5')).toEqual({ kind: 'step', length: 12.5, direction: { kind: 'pointer' } });
  });

  it("L turns left (positive), R right (negative), in degrees or degrees and minutes (22°30' = 22.5°)", () => {
    expect(entry('12.5 L30')).toEqual({ kind: 'step', length: 12.5, direction: { kind: 'deflection', degrees: 30 } });
    expect(entry("20 r 22°30'")).toEqual({
      kind: 'step',
      length: 20,
      direction: { kind: 'deflection', degrees: -22.5 },
    });
  });

  it('bearings clockwise from north: @45; N45E = 45°, S30E = 150°, S30W = 210°, N10W = 350°', () => {
    const bearing = (t: string) => {
      const e = entry(t);
      return e.kind === 'step' && e.direction.kind === 'bearing' ? e.direction.degrees : NaN;
    };
    expect(bearing('12.5 @45')).toBe(45);
    expect(bearing('12.5 N45E')).toBe(45);
    expect(bearing('12.5 S30E')).toBe(150);
    expect(bearing('12.5 S30W')).toBe(210);
    expect(bearing('12.5 N10W')).toBe(350);
  });

  it('a US length with a turn: 100 ft R45 is 30.48 m turning 45° right', () => {
    const e = entry('100 ft R45', 'us');
    expect(e.kind === 'step' && e.direction).toEqual({ kind: 'deflection', degrees: -45 });
    expectClose(e.kind === 'step' ? e.length : NaN, 100 * FT, 1e-12);
  });
});

describe('coordinates typed while drawing', () => {
  it('E then N, or N then E, in display units or with a unit', () => {
    expect(entry('E 120.5 N 340')).toEqual({ kind: 'point', x: 120.5, y: 340 });
    expect(entry('n -20 e 15')).toEqual({ kind: 'point', x: 15, y: -20 });
    const us = entry('E 100 N 200', 'us');
    expect(us.kind === 'point' && [us.x, us.y]).toEqual([100 * FT, 200 * FT]);
  });
});

describe('what is refused, and the message', () => {
  it.each([
    ['', /type a length/],
    ['abc', /“abc” is not a length/],
    ['12.5 L200', /a turn is 0° to 180°/],
    ['12.5 @400', /a bearing is 0° up to 360°/],
    ['12.5 N95E', /a quadrant bearing is 0° to 90°/],
    ['-5', /the length must be more than 0/],
    ['L30', /give the length before the direction/],
    ['E 12 N x', /northing: “x” is not a length/],
  ])('%s', (text, expected) => {
    expect(message(text)).toMatch(expected);
  });
});

describe('the entry in words', () => {
  it('says what Enter will do', () => {
    expect(describeEntry(entry('12.5 L30'), 'si')).toBe('12.500 m, turning 30° left');
    expect(describeEntry(entry('12.5 @45'), 'si')).toBe('12.500 m at bearing 45°');
    // Coordinates to the schedule's 0.01 m: a typed E 60 reads 60.00 m, not 60.0000 m.
    expect(describeEntry(entry('E 120 N 340'), 'si')).toBe('node at E 120.00 m, N 340.00 m');
    expect(describeEntry(entry('E 60 N 0'), 'si')).toBe('node at E 60.00 m, N 0.00 m');
  });
});
