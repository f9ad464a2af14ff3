import { describe, expect, it } from 'vitest';
import type { Soil } from '@mainbrace/solver';
import { EDITED_SOURCE, withSourceKept } from './soilSource.js';

const sand: Soil = {
  id: 'sand',
  label: 'Sand',
  bearing: 95760,
  unitWeight: 18850,
  frictionAngle: 30,
  cohesion: 0,
  source: 'Common practice: the sand row (2,000 lb/ft²)',
};

describe('a soil’s source after an edit (invariant: a source never vouches for values it did not give)', () => {
  it('says the values were edited once one it vouched for changes, keeping the old text', () => {
    const patch = withSourceKept(sand, { bearing: 75e3 });
    expect(patch.bearing).toBe(75e3);
    expect(patch.source).toBe(`${EDITED_SOURCE} (was: Common practice: the sand row (2,000 lb/ft²))`);
    // a second edit keeps the first flag, not a flag of a flag
    expect(withSourceKept({ ...sand, ...patch }, { cohesion: 10e3 }).source).toBeUndefined();
  });

  it('keeps the source when nothing it vouched for changed, or the user writes one', () => {
    expect(withSourceKept(sand, { label: 'Firm sand' }).source).toBeUndefined();
    expect(withSourceKept(sand, { bearing: sand.bearing }).source).toBeUndefined();
    expect(withSourceKept(sand, { bearing: 75e3, source: 'Site report GR-7, BH2' }).source).toBe(
      'Site report GR-7, BH2',
    );
  });

  it('stays within the file’s 400 characters', () => {
    const long = { ...sand, source: 'x'.repeat(400) };
    expect(withSourceKept(long, { frictionAngle: 25 }).source!.length).toBeLessThanOrEqual(400);
  });
});
