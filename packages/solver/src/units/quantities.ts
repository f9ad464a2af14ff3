import { VALUES } from '../provenance/registerValues.js';
/**
 * Branded SI lengths and areas where the code most easily mixes them up (diameters and the areas
 * made from them). Everything inside the solver is SI; the constructors are identity functions.
 */
declare const brand: unique symbol;
type Brand<T, B extends string> = T & { readonly [brand]: B };

/** metre */
export type Meters = Brand<number, 'm'>;
/** square metre */
export type SquareMeters = Brand<number, 'm2'>;

export const meters = (v: number) => v as Meters;

/** Standard acceleration of gravity, m/s², exact (register: gravity.standard). */
export const STANDARD_GRAVITY = VALUES['gravity.standard'];

/** Area of a circle of diameter d, m². */
export const circleArea = (d: Meters): SquareMeters => ((Math.PI * d * d) / 4) as SquareMeters;
