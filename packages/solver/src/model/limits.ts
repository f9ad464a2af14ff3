import type { Dimension } from '../units/conversions.js';

/**
 * The one set of plausibility ranges for every number a project holds, SI. Outside `hard` a value is
 * refused, naming the field (the file schema, the app's fields and the command line all use this
 * table); outside `usual` it is accepted with a warning diagnostic, because it is more likely a unit
 * slip (kPa typed as Pa, mm as m) than a real design.
 */
export interface Limit {
  kind: Dimension;
  hard: { min: number; max: number; exclusiveMin?: boolean };
  usual?: { min: number; max: number };
  /** what the number is, for messages */
  name: string;
}

const limit = (kind: Dimension, name: string, hard: Limit['hard'], usual?: Limit['usual']): Limit =>
  usual ? { kind, name, hard, usual } : { kind, name, hard };

/** Ranges by what the number is (hard limits keep every product of the solver finite in doubles). */
export const LIMITS = {
  pressure: limit('pressure', 'case pressure', { min: 0, max: 10e6 }, { min: 50e3, max: 3e6 }),
  elevation: limit('elevation', 'elevation', { min: -1e4, max: 1e4 }),
  coordinate: limit('length', 'plan coordinate', { min: -2e7, max: 2e7 }),
  cover: limit('length', 'depth of cover', { min: 0, max: 30 }, { min: 0.3, max: 6 }),
  flowFactor: limit('ratio', 'flow factor', { min: -10, max: 10 }),
  flow: limit('flow', 'flow', { min: -100, max: 100 }),
  velocity: limit('velocity', 'flow velocity', { min: 0, max: Infinity }, { min: 0, max: 5 }),
  outsideDiameter: limit('diameter', 'outside diameter', { min: 0.01, max: 5 }, { min: 0.05, max: 2 }),
  insideDiameter: limit('diameter', 'inside diameter', { min: 0.005, max: 5 }),
  density: limit('density', 'water density', { min: 900, max: 1100 }, { min: 990, max: 1030 }),
  concreteUnitWeight: limit(
    'unitWeight',
    'concrete unit weight',
    { min: 15000, max: 40000 },
    { min: 21000, max: 26000 },
  ),
  blockDepth: limit('length', 'block thickness', { min: 0.1, max: 5 }, { min: 0.3, max: 2 }),
  trenchWidth: limit('length', 'trench width', { min: 0.1, max: 20 }, { min: 0.3, max: 5 }),
  dimensionStep: limit('length', 'construction step', { min: 0.001, max: 0.3 }),
  layingLength: limit('length', 'pipe laying length', { min: 0.5, max: 30 }),
  concreteWaste: limit('ratio', 'concrete waste allowance', { min: 0, max: 1 }, { min: 0, max: 0.25 }),
  safetyFactor: limit('ratio', 'safety factor', { min: 1, max: 10 }, { min: 1.25, max: 3 }),
  bearing: limit('stress', 'allowable bearing', { min: 0, max: 5e6 }, { min: 0, max: 1e6 }),
  bearingPerDepth: limit('stressGradient', 'bearing per depth', { min: 0, max: 1e6 }),
  soilUnitWeight: limit('unitWeight', 'soil unit weight', { min: 10000, max: 30000 }, { min: 14000, max: 23000 }),
  frictionAngle: limit('angle', 'friction angle', { min: 0, max: 59 }, { min: 0, max: 45 }),
  cohesion: limit('stress', 'cohesion', { min: 0, max: 1e6 }, { min: 0, max: 300e3 }),
  minCover: limit('length', 'least cover', { min: 0, max: 30 }),
  ratio: limit('ratio', 'ratio', { min: 0, max: 1 }),
  weightPerLength: limit('forcePerLength', 'pipe weight', { min: 0, max: 1e5, exclusiveMin: true }),
} as const satisfies Record<string, Limit>;

export type LimitId = keyof typeof LIMITS;

/** True when a value lies outside the usual range of its limit. */
export const unusual = (l: Limit, v: number): boolean => l.usual !== undefined && (v < l.usual.min || v > l.usual.max);
