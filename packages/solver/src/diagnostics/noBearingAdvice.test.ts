import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { route } from '../../test/projectBuilder.js';
import { wordingContext } from './context.js';
import { diagnosticText } from './wording.js';

describe('a soil with no bearing, friction or cohesion: the findings give one answer', () => {
  it('none recommends the block another says cannot be used', () => {
    // Peat-like fill at Fennick Marsh: bearing 0, φ = 0, c = 0; a 45° bend in DN300 at 1 MPa.
    const a = analyse(
      route({
        soils: [{ id: 'peat', bearing: 0, frictionAngle: 0, cohesion: 0 }],
        nodes: [
          { id: 'n1', x: -30, y: 0, restraint: 'block' },
          { id: 'n2', x: 0, y: 0, restraint: 'block' },
          { id: 'n3', x: 30 * Math.SQRT1_2, y: 30 * Math.SQRT1_2, restraint: 'block' },
        ],
        pipes: [
          { from: 'n1', to: 'n2', od: 0.326 },
          { from: 'n2', to: 'n3', od: 0.326 },
        ],
      }),
    );
    const f = a.fittings.find((x) => x.node.id === 'n2')!;
    const codes = f.diagnostics.map((d) => d.code);
    expect(codes).toEqual(expect.arrayContaining(['soil.no-bearing', 'joints.no-resistance']));
    const c = wordingContext(a, 'si');
    for (const d of f.diagnostics) expect(diagnosticText(d, c), d.code).not.toMatch(/use a block/i);
  });
});
