import type { Material, Pipe, Project } from '../model/projectSchema.js';
import { VALUES } from '../provenance/registerValues.js';

/** Modulus E (Pa) and Poisson's ratio ν of the pipe materials whose values have a source (register: surge.pipe-elasticity). */
export const PIPE_ELASTICITY: Readonly<Partial<Record<Material, { modulus: number; poisson: number }>>> = (() => {
  const v = VALUES['surge.pipe-elasticity'];
  const of = (m: 'ductile-iron' | 'pvc' | 'hdpe' | 'steel') => ({ modulus: v[`${m}.E`], poisson: v[`${m}.nu`] });
  return { 'ductile-iron': of('ductile-iron'), pvc: of('pvc'), hdpe: of('hdpe'), steel: of('steel') };
})();

/**
 * Support factor c₁ of the wave-speed formula: 1 where each pipe length is free to move at gasketed
 * joints (ductile iron, PVC), 1 − ν² where the pipe is anchored throughout by fused or welded joints
 * (PE, steel) (register: surge.support-factor).
 */
export const supportFactor = (material: Material, poisson: number): number =>
  material === 'hdpe' || material === 'steel' ? 1 - poisson * poisson : 1;

export interface WaveSpeedInput {
  /** m */
  insideDiameter: number;
  /** m */
  wall: number;
  /** Pa, modulus of elasticity of the pipe wall */
  modulus: number;
  /** kg/m³ */
  density: number;
  /** Pa, bulk modulus of the water (register: surge.water-bulk-modulus) */
  bulkModulus?: number;
  /** support factor c₁ (1: free to move at the joints) */
  support?: number;
}

/**
 * Speed of a pressure wave in a water-filled elastic pipe, m/s, by the Korteweg formula
 * a = √(K/ρ) / √(1 + c₁·K·D/(E·e)) (Hicks, Civil Engineering Formulas, Eq. 12.63; register: surge.korteweg).
 * A thin-wall formula: for thick plastic walls (DR below about 20) it is an estimate.
 */
export function waveSpeed(i: WaveSpeedInput): number {
  const k = i.bulkModulus ?? VALUES['surge.water-bulk-modulus'];
  const c1 = i.support ?? 1;
  return Math.sqrt(k / i.density) / Math.sqrt(1 + (c1 * k * i.insideDiameter) / (i.modulus * i.wall));
}

/** Joukowsky pressure rise for an instantaneous velocity change, Pa: ΔP = ρ·a·Δv (register: surge.joukowsky). */
export const joukowsky = (density: number, waveSpeedValue: number, velocityChange: number): number =>
  density * waveSpeedValue * Math.abs(velocityChange);

/** The wave speed of a project pipe from its material, wall and diameter, or null for a material with no values. */
export function pipeWaveSpeed(pipe: Pipe, density: number): number | null {
  const e = PIPE_ELASTICITY[pipe.material];
  if (!e) return null;
  const wall = (pipe.outsideDiameter - pipe.insideDiameter) / 2;
  return waveSpeed({
    insideDiameter: pipe.insideDiameter,
    wall,
    modulus: e.modulus,
    density,
    support: supportFactor(pipe.material, e.poisson),
  });
}

export interface PipeSurge {
  pipe: string;
  /** m/s */
  waveSpeed: number;
  /** m/s, the velocity change taken */
  velocityChange: number;
  /** Pa */
  rise: number;
}

export interface SurgeEstimate {
  /** every pipe that has a wave speed and a velocity change, largest rise first */
  pipes: PipeSurge[];
  /** the pipe of the largest rise */
  largest: PipeSurge;
  /** Pa, the working case's pressure at its datum plus the largest rise: the suggested surge case */
  suggestedPressure: number;
  /** the working case the rise is added to */
  workingCase: string;
  /** pipes left out because their material has no modulus with a source */
  unknownMaterial: string[];
}

/**
 * A surge case from a velocity change: for each pipe ΔP = ρ·a·Δv with a from
 * Korteweg, Δv either the given change or the pipe's whole working flow stopping at once
 * (|Q·flow factor|/A_inside). The largest rise over the route, added to the working case's pressure,
 * is the suggested surge case: conservative, since the rise is taken everywhere at its largest.
 * Null when no pipe has both a wave speed and a velocity change.
 *
 * @param velocityChange m/s, or undefined for each pipe's working flow stopping
 */
export function surgeEstimate(project: Project, velocityChange?: number): SurgeEstimate | null {
  const working =
    project.loadCases.find((c) => c.kind === 'working') ??
    project.loadCases.find((c) => c.kind !== 'test' && c.kind !== 'surge') ??
    project.loadCases[0]!;
  const rho = project.water.density;
  const pipes: PipeSurge[] = [];
  const unknownMaterial: string[] = [];
  for (const pipe of project.pipes) {
    const a = pipeWaveSpeed(pipe, rho);
    if (a === null) {
      unknownMaterial.push(pipe.id);
      continue;
    }
    const dv = velocityChange ?? Math.abs(pipe.flow * working.flowFactor) / ((Math.PI * pipe.insideDiameter ** 2) / 4);
    if (!(dv > 0)) continue;
    pipes.push({ pipe: pipe.id, waveSpeed: a, velocityChange: dv, rise: joukowsky(rho, a, dv) });
  }
  if (pipes.length === 0) return null;
  pipes.sort((x, y) => y.rise - x.rise);
  const largest = pipes[0]!;
  return {
    pipes,
    largest,
    suggestedPressure: working.pressure + largest.rise,
    workingCase: working.id,
    unknownMaterial,
  };
}
