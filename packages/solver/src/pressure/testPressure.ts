import { STANDARD_GRAVITY } from '../units/quantities.js';
import type { LoadCase, Project } from '../model/projectSchema.js';
import { pressureAt } from './nodePressure.js';

/** The field-test rule to apply: AWWA C600 (ductile iron) or AWWA C605 (PVC). */
export type TestRule = 'awwa-c600' | 'awwa-c605';

export interface TestCriterion {
  /** what the criterion says, in words */
  rule: string;
  /** m, elevation where it is stated */
  elevation: number;
  /** Pa, working pressure there */
  working: number;
  /** Pa, least test pressure there */
  least: number;
  /** Pa, the same requirement expressed at the test point */
  atTestPoint: number;
}

export interface TestProposal {
  /** Pa, proposed test pressure at the test point */
  pressure: number;
  /** m, elevation of the test point (the gauge): the test case's datum, else the route's lowest point */
  testPointElevation: number;
  criteria: TestCriterion[];
  /** index into `criteria` of the one that sets the pressure */
  governing: number;
}

/**
 * Least field-test pressure for the route from its working case and its actual elevations:
 * AWWA C600 — at least 1.5 × the working pressure at the point of testing and at least 1.25 × the
 * working pressure at the highest point of the section (AWWA C600, hydrostatic testing, read via a
 * manufacturer's restatement; docs/check-values.md CV-22); AWWA C605 — at least 1.5 × the working pressure at the lowest point
 * (read) and 1.25 × at the highest point (from memory). Static head between points: ρ·g·Δz.
 */
export function proposeTestPressure(
  project: Project,
  working: LoadCase,
  rule: TestRule,
  testPointElevation?: number,
): TestProposal | null {
  if (project.nodes.length === 0) return null;
  const rho = project.water.density;
  let low = Infinity;
  let high = -Infinity;
  for (const n of project.nodes) {
    low = Math.min(low, n.elevation);
    high = Math.max(high, n.elevation);
  }
  const zt = testPointElevation ?? low;
  const carry = (least: number, at: number) => least + rho * STANDARD_GRAVITY * (at - zt);
  const criterion = (text: string, factor: number, at: number): TestCriterion => {
    const w = pressureAt(working, at, rho);
    return { rule: text, elevation: at, working: w, least: factor * w, atTestPoint: carry(factor * w, at) };
  };
  const criteria =
    rule === 'awwa-c600'
      ? [
          criterion('AWWA C600: 1.5 × working pressure at the point of testing', 1.5, zt),
          criterion('AWWA C600: 1.25 × working pressure at the highest point', 1.25, high),
        ]
      : [
          criterion('AWWA C605: 1.5 × working pressure at the lowest point', 1.5, low),
          criterion(
            'AWWA C605: 1.25 × working pressure at the highest point (not verified against AWWA C605-13, hydrostatic testing)',
            1.25,
            high,
          ),
        ];
  let governing = 0;
  criteria.forEach((c, i) => {
    if (c.atTestPoint > criteria[governing]!.atTestPoint) governing = i;
  });
  return { pressure: criteria[governing]!.atTestPoint, testPointElevation: zt, criteria, governing };
}
