import type { Material } from '@mainbrace/solver';

/**
 * The plan's colours and line styles. Pipes are potable-water blue (the usual utility convention);
 * material is told apart by dash pattern, never by colour alone.
 */
export const PALETTE = {
  paper: '#fbfaf6',
  gridMinor: '#ecE9e0',
  gridMajor: '#dcd8cc',
  gridLabel: '#8d897e',
  pipe: '#1d6fb8',
  pipeSelected: '#0b3d6b',
  selection: '#e08a00',
  thrust: '#b83a14',
  block: '#5b5b58',
  blockFill: 'rgba(120, 118, 110, 0.18)',
  anchor: '#2f4858',
  pad: '#6d6a5f',
  restrained: 'rgba(122, 78, 16, 0.42)',
  warning: '#f2c230',
  ink: '#26251f',
  halo: 'rgba(251, 250, 246, 0.9)',
  rubber: '#d0590b',
} as const;

/** Dash pattern per material, in multiples of the stroke width. */
export const MATERIAL_DASH: Record<Material, number[]> = {
  'ductile-iron': [],
  pvc: [4, 2],
  hdpe: [5, 1.5, 1, 1.5],
  steel: [1, 0],
  other: [1, 1.5],
};

export const MATERIAL_NAME: Record<Material, string> = {
  'ductile-iron': 'Ductile iron',
  pvc: 'PVC',
  hdpe: 'HDPE',
  steel: 'Steel',
  other: 'Other',
};

/** Stroke width of a pipe on screen, px, growing with its diameter (m). */
export const pipeWidth = (outsideDiameter: number): number => Math.min(9, Math.max(1.6, 1.4 + outsideDiameter * 9));
