/**
 * Branded SI quantities. Everything inside the solver is SI; a brand keeps a length from being
 * passed where a pressure is expected. Constructors are identity functions at run time.
 */
declare const brand: unique symbol;
type Brand<T, B extends string> = T & { readonly [brand]: B };

/** metre */
export type Meters = Brand<number, 'm'>;
/** square metre */
export type SquareMeters = Brand<number, 'm2'>;
/** cubic metre */
export type CubicMeters = Brand<number, 'm3'>;
/** pascal (N/m²), gauge unless stated */
export type Pascals = Brand<number, 'Pa'>;
/** newton */
export type Newtons = Brand<number, 'N'>;
/** newton per cubic metre (unit weight) */
export type NewtonsPerCubicMeter = Brand<number, 'N/m3'>;
/** kilogram per cubic metre */
export type KilogramsPerCubicMeter = Brand<number, 'kg/m3'>;
/** cubic metre per second */
export type CubicMetersPerSecond = Brand<number, 'm3/s'>;
/** degree of arc */
export type Degrees = Brand<number, 'deg'>;
/** radian */
export type Radians = Brand<number, 'rad'>;

export const meters = (v: number) => v as Meters;
export const squareMeters = (v: number) => v as SquareMeters;
export const cubicMeters = (v: number) => v as CubicMeters;
export const pascals = (v: number) => v as Pascals;
export const newtons = (v: number) => v as Newtons;
export const degrees = (v: number) => v as Degrees;
export const radians = (v: number) => v as Radians;

export const toRadians = (d: Degrees): Radians => radians((d * Math.PI) / 180);
export const toDegrees = (r: Radians): Degrees => degrees((r * 180) / Math.PI);

/** Standard acceleration of gravity, m/s², exact (3rd CGPM 1901; NIST SP 330). */
export const STANDARD_GRAVITY = 9.80665;

/** Area of a circle of diameter d, m². */
export const circleArea = (d: Meters): SquareMeters => squareMeters((Math.PI * d * d) / 4);
