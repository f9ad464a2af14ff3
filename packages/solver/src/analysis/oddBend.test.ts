import { describe, it, expect } from 'vitest';
import { analyse } from './analyse.js';
import { bendRoute } from '../../test/projectBuilder.js';
import { diagnosticText } from '../diagnostics/wording.js';
import { notVerifiedText } from '../provenance/entry.js';
import { REGISTER } from '../provenance/register.js';
import { plainWording as context } from '../../test/plainWording.js';

/** The odd-bend finding at the bend of a route turned `deg`, DN300 at 1 MPa, or undefined. */
const oddBend = (deg: number) =>
  analyse(bendRoute(deg, 0.326, 1e6))
    .fittings.find((f) => f.node.id === 'n2')!
    .diagnostics.find((d) => d.code === 'fitting.odd-bend');

// Standard bend fittings turn 90°, 45°, 22½° and 11¼° (¼, ⅛, ¹⁄₁₆ and ¹⁄₃₂ bends, AWWA C110/A21.10; from
// memory); a joint takes up the straight-joint tolerance, 0.5° (register: fitting.straight-tolerance).
describe('a bend no standard fitting makes', () => {
  it('is named with its nearest standard bend: 47° → 45°, 30° → 22.5°, 70° → 90°', () => {
    expect(oddBend(47)?.values).toEqual({ angle: expect.closeTo(47, 6), nearest: 45 });
    expect(oddBend(30)?.values.nearest).toBe(22.5);
    expect(oddBend(70)?.values.nearest).toBe(90);
    expect(oddBend(47)?.severity).toBe('info');
  });
  it('passes every standard angle and one within the joints’ 0.5° of it', () => {
    for (const deg of [11.25, 22.5, 45, 90, 45.4, 89.6]) expect(oddBend(deg), `${deg}°`).toBeUndefined();
  });
  it('under half the smallest bend (5.625°) it is a deflection at the joints, with no fitting named', () => {
    const d = oddBend(4)!;
    expect(d.values.nearest).toBeUndefined();
    expect(diagnosticText(d, context)).toMatch(/^No bend fitting turns as little as 4°: deflect the joints here/);
  });
  it('says which standard the angles were not verified against, as the register does', () => {
    const text = diagnosticText(oddBend(47)!, context);
    expect(text).toContain('No standard bend turns 47°: the nearest is 45°.');
    const e = REGISTER['fitting.standard-bends'];
    expect(e.verified).toBe(false);
    expect(text).toContain(`(standard bends ${notVerifiedText(e)})`);
  });
});
