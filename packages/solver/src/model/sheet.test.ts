import { describe, expect, it } from 'vitest';
import { sheetSchema } from './projectSchema.js';
import { blankSheet, sheetOf } from './sheet.js';

describe('the title block without the schema library', () => {
  it('fills in what the schema fills in (invariant: the same defaults)', () => {
    expect(blankSheet()).toEqual(sheetSchema.parse({}));
    expect(sheetOf({ revision: 'B', chainageStyle: 'stations' })).toEqual(
      sheetSchema.parse({ revision: 'B', chainageStyle: 'stations' }),
    );
  });
});
