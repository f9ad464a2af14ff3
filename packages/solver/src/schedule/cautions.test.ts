import { describe, it, expect } from 'vitest';
import { CAUTIONS, PAGE_CAUTIONS } from './cautions.js';
import { SHORT_CAUTION } from './shortCaution.js';

/**
 * The five cautions every result screen and printed page carries (docs/project-format.md; the usual
 * cautions of utility specifications and the DIPRA thrust-restraint manual): a design aid only, checked
 * by a licensed engineer, local codes and the utility's standards govern, blocks bear on undisturbed
 * soil, the concrete cures before the pressure test.
 */
const FIVE: [string, RegExp][] = [
  ['design aid', /design aid/i],
  ['licensed engineer', /licensed (professional )?engineer/i],
  ['local codes and the utility’s standards', /local codes.*utility’s standards/i],
  ['undisturbed soil', /undisturbed soil/i],
  ['cure before testing', /cure.*before.*(pressure )?test/i],
];

describe('cautions', () => {
  it('the line on every result screen names all five', () => {
    for (const [what, pattern] of FIVE) expect(SHORT_CAUTION, what).toMatch(pattern);
  });

  it('every printed page names all five, and the full list holds each page caution', () => {
    const page = PAGE_CAUTIONS.join(' ');
    for (const [what, pattern] of FIVE) expect(page, what).toMatch(pattern);
    for (const c of PAGE_CAUTIONS) expect(CAUTIONS).toContain(c);
    // The crew runs the field test from the printed sheet: bulkheads braced, the test held to the design.
    expect(page).toMatch(/test bulkheads for the full test thrust/);
    expect(page).toMatch(/test pressure must not exceed the thrust-restraint design pressure/);
  });
});
