import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseProjectText } from '../model/parseProject.js';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from './scheduleOf.js';
import { anchorConcrete, blockConcrete, concretePieces } from './concrete.js';
import { scheduleView } from './scheduleView.js';
import { WORDING } from '../diagnostics/codeMeanings.js';
import { builtInches } from '../units/format.js';

// 1 in = 0.0254 m exactly (NIST SP 811, appendix B).
const IN3 = 0.0254 ** 3;

describe('concrete as a crew builds it from the sheet', () => {
  it('is the sized box in SI on the usual 50 mm step', () => {
    // 0.35 × 0.30 × 0.60 m = 0.063 m³ (hand calculation)
    expect(blockConcrete({ faceWidth: 0.35, faceHeight: 0.3, depth: 0.6 }, 'si')).toBeCloseTo(0.063, 12);
  });

  it('in US units multiplies the dimensions as printed, each rounded up to the inch', () => {
    // 0.35 m = 13.78 in → 14 in; 0.30 m = 11.81 in → 12 in; 0.60 m = 23.62 in → 24 in: 4,032 in³ (2.333 ft³),
    // where the metric box is 0.063 m³ = 3,844 in³: the crew pours the larger.
    expect(blockConcrete({ faceWidth: 0.35, faceHeight: 0.3, depth: 0.6 }, 'us')).toBeCloseTo(4032 * IN3, 12);
    // an anchor cube of 0.85 m = 33.46 in → 34 in: 39,304 in³
    expect(anchorConcrete({ side: 0.85 }, 'us')).toBeCloseTo(34 ** 3 * IN3, 12);
  });

  it('agrees with the printed dimensions on every fitting of the demo shown in US units (invariant)', () => {
    const parsed = parseProjectText(
      readFileSync(new URL('../../../../public/demo/larkspur-rise.json', import.meta.url), 'utf8'),
    );
    if (!parsed.ok) throw new Error('demo does not parse');
    const a = analyse(parsed.project);
    const step = parsed.project.design.dimensionStep;
    const view = scheduleView(a, 'us', WORDING);
    let blocks = 0;
    for (const [i, f] of scheduleOf(a).fittings.entries()) {
      const b = f.restraint.block;
      if (!b) continue;
      blocks++;
      const printed = builtInches(b.faceWidth) * builtInches(b.faceHeight) * builtInches(b.depth) * IN3;
      expect(view.rows[i]!.values.blockConcrete).toBeCloseTo(printed, 12);
      expect(concretePieces(f.restraint, step, 'us').find((p) => p.element === 'block')!.volume).toBeCloseTo(
        printed,
        12,
      );
    }
    expect(blocks).toBeGreaterThan(3);
  });
});
