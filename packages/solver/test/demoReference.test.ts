import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseProject } from '../src/model/parseProject.js';
import { analyse } from '../src/analysis/analyse.js';
import { expectClose } from './tolerance.js';

// A whole-project reference case, worked by hand on the demo file (never regenerated from the solver).
const file = fileURLToPath(new URL('../../../public/demo/larkspur-rise.json', import.meta.url));
const parsed = parseProject(JSON.parse(readFileSync(file, 'utf8')));
if (!parsed.ok) throw new Error('the demo project must be valid');
const a = analyse(parsed.project);

describe('the demo route, B2, worked by hand', () => {
  // Node n2 at (120, 0), z 103.2 m, between n1 (0, 0, 104.0) and n3 (203.15, 34.44, 102.5); DN300 OD 0.326 m.
  // Field test 1,035 kPa at datum 97.0 m: p = 1,035,000 + 998.2 × 9.80665 × (97.0 − 103.2) = 974,308.2 Pa.
  // A = π/4 × 0.326² = 0.0834690 m²; F = −p·A·(n₁ + n₂) = (6,190.33, −31,119.17, 90.35) N; |F_h| = 31,728.9 N.
  const f = a.byNode.get('n2')!;

  it('has the field test govern at 974.3 kPa with the vector of the hand sum', () => {
    expect(f.envelope.governing.caseId).toBe('test');
    expectClose(f.envelope.governing.pressure, 974_308.2, 1e-7);
    expectClose(f.envelope.governing.total[0], 6_190.33, 1e-5);
    expectClose(f.envelope.governing.total[1], -31_119.17, 1e-6);
    expectClose(f.envelope.governing.total[2], 90.35, 1e-3);
  });

  it('gets a 1.00 m × 0.50 m face for 0.497 m² on 95.76 kPa sand: the least face of whole 50 mm steps', () => {
    // A = 1.5 × 31,728.9 / 95,761 = 0.49700 m²; centre depth 1.5 + 0.163 = 1.663 m → h ≤ ⅔ × 1.663 = 1.109
    // → 1.10 m; h ≥ OD → 0.35 m; b ≤ 2h below the tallest. Least b·h ≥ A over h = 0.35 … 1.10 m:
    // h 0.35 → b ≤ 0.70, 0.245 m² short; 0.40 → 0.32 short; 0.45 → needs 1.15 > 0.90; 0.50 → b = 0.994
    // → 1.00 m, 0.500 m²; 0.55 → 0.95, 0.5225; 0.60 → 0.85, 0.510; 0.65 → 0.80, 0.520; 0.70 → 0.75, 0.525;
    // 0.75 → 0.70, 0.525; … 1.00 → 0.50, 0.500 (as square as 1.00 × 0.50; the lower face is kept).
    // Concrete 1.00 × 0.50 × 0.6 = 0.300 m³.
    const b = f.restraint.block!;
    expectClose(b.bearingArea, 0.497001, 1e-5);
    expectClose(b.faceHeight, 0.5, 1e-12);
    expectClose(b.faceWidth, 1.0, 1e-12);
    expectClose(b.concreteVolume, 0.3, 1e-12);
    expect(b.passiveRatio).toBeGreaterThanOrEqual(1.5);
    expect(f.restraint.anchor).toBeNull(); // its 0.300 m³ weighs 7.1 kN ≥ 1.5 × 90 N of uplift
  });
});
