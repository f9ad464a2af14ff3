/**
 * Rankine passive earth-pressure coefficient Kp = tan²(45° + φ/2) = (1 + sin φ)/(1 − sin φ)
 * (Rankine 1857; any soil-mechanics text, e.g. Craig, "Soil Mechanics", ch. on lateral pressure).
 *
 * @param frictionAngle φ, degrees
 */
export function rankinePassiveCoefficient(frictionAngle: number): number {
  const s = Math.sin((frictionAngle * Math.PI) / 180);
  return (1 + s) / (1 - s);
}

/** What a block's face search needs of the soil's friction angle: Kp, √Kp, Kp − Ka and (Kp − Ka)^⅔. */
export interface PassiveConstants {
  frictionAngle: number;
  kp: number;
  sqrtKp: number;
  /** Kp − Ka = Kp − 1/Kp */
  d: number;
  /** (Kp − Ka)^⅔ */
  d23: number;
}

let lastConstants: PassiveConstants = passiveConstantsOf(NaN);

function passiveConstantsOf(frictionAngle: number): PassiveConstants {
  const kp = rankinePassiveCoefficient(frictionAngle);
  const d = kp - 1 / kp;
  return { frictionAngle, kp, sqrtKp: Math.sqrt(kp), d, d23: d ** (2 / 3) };
}

/**
 * `passiveConstantsOf`, remembered for the last friction angle asked: a route's blocks are sized one
 * after the other, mostly in one soil, and the power and the sine were a tenth of sizing a block
 * (docs/performance.md). The same arithmetic, so the same numbers.
 */
export function passiveConstants(frictionAngle: number): PassiveConstants {
  if (lastConstants.frictionAngle !== frictionAngle) lastConstants = passiveConstantsOf(frictionAngle);
  return lastConstants;
}

/**
 * Effective vertical stress at depth z below ground, Pa: γ·z above the water table at depth zw,
 * γ·zw + (γ − γw)·(z − zw) below it (the soil's unit weight taken as saturated below the water
 * table; a soil lighter than water adds nothing).
 */
export function effectiveStress(
  z: number,
  unitWeight: number,
  waterDepth: number | null,
  waterUnitWeight: number,
): number {
  if (waterDepth === null || z <= waterDepth) return unitWeight * z;
  const zw = Math.max(0, waterDepth);
  return unitWeight * zw + Math.max(0, unitWeight - waterUnitWeight) * (z - zw);
}

/** ∫ σ'v dz from z1 to z2 (depths below ground, m), N/m, with σ'v as `effectiveStress`. */
function effectiveStressIntegral(
  z1: number,
  z2: number,
  unitWeight: number,
  waterDepth: number | null,
  waterUnitWeight: number,
): number {
  const dry = (a: number, b: number) => (unitWeight * (b * b - a * a)) / 2;
  if (waterDepth === null || waterDepth >= z2) return dry(z1, z2);
  const zw = Math.max(waterDepth, 0);
  const top = Math.max(z1, zw);
  const submerged = Math.max(0, unitWeight - waterUnitWeight);
  const wet = unitWeight * zw * (z2 - top) + (submerged * ((z2 - zw) ** 2 - (top - zw) ** 2)) / 2;
  return (z1 < zw ? dry(z1, zw) : 0) + wet;
}

export interface PassiveInput {
  /** m, face width */
  width: number;
  /** m, depth of the face's top below ground */
  top: number;
  /** m, depth of the face's bottom below ground */
  bottom: number;
  /** N/m³ */
  unitWeight: number;
  /** degrees */
  frictionAngle: number;
  /** Pa */
  cohesion: number;
  /** m below ground of the water table, or null when it is below the face */
  waterDepth: number | null;
  /** N/m³, ρ·g of the groundwater */
  waterUnitWeight: number;
}

/**
 * Ultimate passive resistance of a vertical block face, N (Rankine earth pressure with
 * cohesion, as AWWA M23 and utility details apply it): R_p = b·∫[Kp·σ'v(z) + 2c·√Kp] dz, which is b·[½γKp(z2² − z1²) + 2c√Kp(z2 − z1)] in dry
 * soil. Water pressure acts on both faces of the block and cancels.
 */
export function passiveResistance(p: PassiveInput): number {
  const kp = rankinePassiveCoefficient(p.frictionAngle);
  return (
    p.width *
    passivePerWidth(kp, Math.sqrt(kp), p.top, p.bottom, p.unitWeight, p.cohesion, p.waterDepth, p.waterUnitWeight)
  );
}

/**
 * `passiveResistance` per metre of face width, N/m, with Kp and √Kp given: a search over many faces of
 * one soil works them out once. The same arithmetic in the same order, so the same numbers.
 */
export function passivePerWidth(
  kp: number,
  sqrtKp: number,
  faceTop: number,
  bottom: number,
  unitWeight: number,
  cohesion: number,
  waterDepth: number | null,
  waterUnitWeight: number,
): number {
  const top = Math.max(0, faceTop);
  const stress = effectiveStressIntegral(top, bottom, unitWeight, waterDepth, waterUnitWeight);
  return kp * stress + 2 * cohesion * sqrtKp * (bottom - top);
}

export interface OvesenInput {
  /** degrees */
  frictionAngle: number;
  /** m, depth of the face's top below ground */
  top: number;
  /** m, depth of the face's bottom below ground */
  bottom: number;
  /** m, face width */
  width: number;
}

/**
 * Ovesen's three-dimensional factor for the passive resistance of a single short anchor block (Ovesen
 * 1964, Danish Geotechnical Institute Bulletin No. 16, as restated by Duncan & Mokwa 2001, J. Geotech.
 * Geoenviron. Eng. 127(3):248–257; the equation is recalled, from memory — register `passive.ovesen`):
 *
 *   M = 1 + (Kp − Ka)^(2/3) · [1.1·E⁴ + 1.6·B/(1 + 5·b/h) + 0.4·(Kp − Ka)·E³·B²/(1 + 0.05·b/h)]
 *
 * with E = 1 − h/(z + h) (z the depth to the face's top, so E = z_top/z_bottom), B = 1 − (b/s)² = 1 for a
 * single block (no neighbour at spacing s), b the face width and h its height. It multiplies the 2-D
 * resistance of the face; with the Rankine Kp (no wall friction) used here the product stays below the
 * log-spiral value the factor was fitted to. For φ = 0, Kp = Ka = 1 and M = 1: no 3-D gain is taken in
 * undrained clay.
 */
export function ovesenFactor(p: OvesenInput): number {
  const kp = rankinePassiveCoefficient(p.frictionAngle);
  const d = kp - 1 / kp;
  const h = p.bottom - Math.max(0, p.top);
  if (!(h > 0) || !(p.width > 0) || d <= 0) return 1;
  const e = 1 - h / p.bottom;
  return ovesenAt(d ** (2 / 3), ovesenDepthTerm(e), ovesenDepthTerm3(d, e), h, p.width);
}

const SPACING = 1; // B = 1 − (b/s)² with no neighbouring block

/**
 * The parts of Ovesen's factor that do not depend on the width, for a face of depth ratio E: 1.1·E⁴
 * and 0.4·(Kp − Ka)·E³·B². `ovesenAt` finishes the factor for a width; a search over widths at one
 * height works these out once (the same arithmetic, so the same numbers as `ovesenFactor`).
 */
export const ovesenDepthTerm = (e: number): number => 1.1 * e ** 4;
export const ovesenDepthTerm3 = (d: number, e: number): number => 0.4 * d * e ** 3 * SPACING ** 2;

/** Ovesen's factor from (Kp − Ka)^⅔, the two depth terms, the face height h > 0 and width b > 0. */
export function ovesenAt(d23: number, term4: number, term3: number, h: number, width: number): number {
  const r = width / h;
  return 1 + d23 * (term4 + (1.6 * SPACING) / (1 + 5 * r) + term3 / (1 + 0.05 * r));
}
