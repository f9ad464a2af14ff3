/** Unit weight of water, N/m³, at 998.2 kg/m³ × 9.80665 m/s² (used for submerged weights). */
export const WATER_UNIT_WEIGHT = 998.2 * 9.80665;

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

/**
 * ∫ σ'v dz from z1 to z2 (depths below ground, m), N/m: effective vertical stress γ·z above the
 * water table at depth zw, γ·zw + (γ − γw)·(z − zw) below it (the soil's unit weight taken as
 * saturated below the water table).
 */
function effectiveStressIntegral(z1: number, z2: number, unitWeight: number, waterDepth: number | null): number {
  const dry = (a: number, b: number) => (unitWeight * (b * b - a * a)) / 2;
  if (waterDepth === null || waterDepth >= z2) return dry(z1, z2);
  const zw = Math.max(waterDepth, 0);
  const top = Math.max(z1, zw);
  const submerged = unitWeight - WATER_UNIT_WEIGHT;
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
  /** m below ground, or null when the water table is below the face */
  waterDepth: number | null;
}

/**
 * Ultimate passive resistance of a vertical block face, N (domain reference §4.6, Rankine with
 * cohesion): R_p = b·∫[Kp·σ'v(z) + 2c·√Kp] dz, which is b·[½γKp(z2² − z1²) + 2c√Kp(z2 − z1)] in dry
 * soil. Water pressure acts on both faces of the block and cancels.
 */
export function passiveResistance(p: PassiveInput): number {
  const kp = rankinePassiveCoefficient(p.frictionAngle);
  const top = Math.max(0, p.top);
  const stress = effectiveStressIntegral(top, p.bottom, p.unitWeight, p.waterDepth);
  return p.width * (kp * stress + 2 * p.cohesion * Math.sqrt(kp) * (p.bottom - top));
}
