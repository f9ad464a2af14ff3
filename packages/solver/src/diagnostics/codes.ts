import type { Dimension } from '../units/conversions.js';

/** info: a fact worth knowing; warning: check before building; error: the restraint is not adequate as it stands. */
export type Severity = 'info' | 'warning' | 'error';

export interface CodeSpec {
  severity: Severity;
  /** the SI values a diagnostic of this code carries, with the kind of quantity of each */
  values: Readonly<Record<string, Dimension>>;
}

/**
 * Every finding the solver can report, by stable code. Codes never change meaning; a new finding gets a
 * new code. What each means and what to do is worded in codeMeanings.ts, which the app loads apart from
 * its first screen; docs/diagnostics.md is generated from both (a test keeps it current).
 */
export const DIAGNOSTIC_CODES = {
  'pressure.vapour-floor': {
    severity: 'warning',
    values: { pressure: 'pressure' },
  },
  'pressure.below-zero': {
    severity: 'warning',
    values: { pressure: 'pressure' },
  },
  'flow.into-cap': {
    severity: 'warning',
    values: { flow: 'flow' },
  },
  'flow.unbalanced': {
    severity: 'warning',
    values: { net: 'flow' },
  },
  'valve.both-ways': {
    severity: 'info',
    values: {},
  },
  'valve.flag-ignored': {
    severity: 'warning',
    values: {},
  },
  'fitting.many-pipes': {
    severity: 'warning',
    values: {},
  },
  'fitting.bent-run': {
    severity: 'warning',
    values: { turn: 'angle' },
  },
  'fitting.odd-bend': {
    severity: 'info',
    values: { angle: 'angle', nearest: 'angle' },
  },
  'thrust.none': {
    severity: 'info',
    values: {},
  },
  'anchor.submerged': {
    severity: 'info',
    values: { unitWeight: 'unitWeight' },
  },
  'anchor.no-weight': {
    severity: 'error',
    values: { concreteUnitWeight: 'unitWeight', waterUnitWeight: 'unitWeight', upward: 'force' },
  },
  'soil.no-bearing': {
    severity: 'warning',
    values: {},
  },
  'soil.below-min-cover': {
    severity: 'warning',
    values: { minCover: 'length', cover: 'length' },
  },
  'block.wider-than-trench': {
    severity: 'warning',
    values: { faceWidth: 'length', trenchWidth: 'length' },
  },
  'block.thrust-reverses': {
    severity: 'info',
    values: { force: 'force' },
  },
  'block.taller-than-cover': {
    severity: 'warning',
    values: { faceHeight: 'length', bottomDepth: 'length', centreDepth: 'length' },
  },
  'block.wide-face': {
    severity: 'warning',
    values: { faceWidth: 'length', faceHeight: 'length' },
  },
  'block.none-holds': {
    severity: 'warning',
    values: {
      thrust: 'force',
      ratio: 'ratio',
      safetyFactor: 'ratio',
      bearingArea: 'area',
      largestFace: 'area',
      faceWidth: 'length',
      faceHeight: 'length',
    },
  },
  'pad.no-bearing': {
    severity: 'warning',
    values: {},
  },
  'joints.no-resistance': {
    severity: 'error',
    values: { frictionAngle: 'angle', cohesion: 'stress' },
  },
  'joints.encroach': {
    severity: 'warning',
    values: { length: 'length', legLength: 'length' },
  },
  'joints.longer-than-route': {
    severity: 'error',
    values: { length: 'length', reach: 'length' },
  },
  'joints.into-existing-main': {
    severity: 'warning',
    values: { length: 'length', reach: 'length', beyond: 'length' },
  },
  'joints.fused-pe': {
    severity: 'info',
    values: {},
  },
  'joints.material-basis': {
    severity: 'warning',
    values: {},
  },
  'joints.no-material-basis': {
    severity: 'error',
    values: { frictionMissing: 'ratio', adhesionMissing: 'ratio' },
  },
  'joints.sharp-bend': {
    severity: 'warning',
    values: { deflection: 'angle' },
  },
  'pipe.over-working-rating': {
    severity: 'error',
    values: { pressure: 'pressure', limit: 'pressure' },
  },
  'pipe.over-surge-rating': {
    severity: 'error',
    values: { pressure: 'pressure', limit: 'pressure' },
  },
  'pipe.over-test-rating': {
    severity: 'error',
    values: { pressure: 'pressure', limit: 'pressure' },
  },
  'input.pressure-unusual': {
    severity: 'warning',
    values: { value: 'pressure', low: 'pressure', high: 'pressure' },
  },
  'input.cover-unusual': {
    severity: 'warning',
    values: { value: 'length', low: 'length', high: 'length' },
  },
  'input.groundwater-above-ground': {
    severity: 'warning',
    values: { groundwater: 'elevation', highestGround: 'elevation' },
  },
  'input.groundwater-above-some-ground': {
    severity: 'warning',
    values: { groundwater: 'elevation', lowestGround: 'elevation', flooded: 'ratio' },
  },
  'input.velocity-unusual': {
    severity: 'warning',
    values: { value: 'velocity', low: 'velocity', high: 'velocity' },
  },
  'input.diameter-unusual': {
    severity: 'warning',
    values: { value: 'diameter', low: 'diameter', high: 'diameter' },
  },
  'input.density-unusual': {
    severity: 'warning',
    values: { value: 'density', low: 'density', high: 'density' },
  },
  'input.unit-weight-unusual': {
    severity: 'warning',
    values: { value: 'unitWeight', low: 'unitWeight', high: 'unitWeight' },
  },
  'input.length-unusual': {
    severity: 'warning',
    values: { value: 'length', low: 'length', high: 'length' },
  },
  'input.stress-unusual': {
    severity: 'warning',
    values: { value: 'stress', low: 'stress', high: 'stress' },
  },
  'input.angle-unusual': {
    severity: 'warning',
    values: { value: 'angle', low: 'angle', high: 'angle' },
  },
  'input.factor-unusual': {
    severity: 'warning',
    values: { value: 'ratio', low: 'ratio', high: 'ratio' },
  },
} as const satisfies Record<string, CodeSpec>;

export type DiagnosticCode = keyof typeof DIAGNOSTIC_CODES;
