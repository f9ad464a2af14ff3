import { describe, it, expect } from 'vitest';
import { diagnostic } from './diagnostic.js';
import { diagnosticText } from './wording.js';
import { plainWording as context } from '../../test/plainWording.js';

/** The finding for a 100 kN thrust at a safety factor of 1.5, with the limit figures given. */
const noneHolds = (bearingArea: number, largestFace: number, ratio: number) =>
  diagnosticText(
    diagnostic(
      'block.none-holds',
      {},
      { thrust: 100_000, ratio, safetyFactor: 1.5, bearingArea, largestFace, faceWidth: 2.4, faceHeight: 1.2 },
    ),
    context,
  );

describe('a fitting no block can hold says which limit failed (the block search, bearingBlock.ts)', () => {
  it('bearing alone: the area, and no passive figure that in fact passes', () => {
    const t = noneHolds(3.5, 2.88, 1.57);
    expect(t).toContain(
      'bearing governs: a face of 3.50 m² is needed for bearing and the largest the limits allow is 2.88 m²',
    );
    expect(t).not.toContain('resists');
  });
  it('passive pressure alone: the strongest face and its ratio against the factor', () => {
    const t = noneHolds(1.0, 2.88, 1.2);
    expect(t).toContain(
      'passive pressure governs: the strongest face, 2.40 m wide × 1.20 m high, resists only 1.2 × the thrust',
    );
    expect(t).toContain('(1.5 needed)');
    expect(t).not.toContain('is needed for bearing');
  });
  it('both limits', () => {
    const t = noneHolds(3.5, 2.88, 1.2);
    expect(t).toContain('is needed for bearing');
    expect(t).toContain('resists only 1.2 × the thrust');
  });
  it('neither alone: no face has both', () => {
    expect(noneHolds(2.0, 2.88, 1.6)).toContain(
      'no face has both the area bearing needs (2.00 m²) and the passive resistance',
    );
  });
});

describe('a restrained zone cut to the line reads as its row does', () => {
  it('40.05 m of line reads 40.1 m, as the restrained column rounds it up (columnUnits.ts: 0.1 m, up)', () => {
    const t = diagnosticText(diagnostic('joints.longer-than-route', {}, { length: 52.3, reach: 40.05 }), context);
    expect(t).toContain('it is cut to 40.1 m');
  });
});
