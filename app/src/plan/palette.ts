import type { Material } from '@mainbrace/solver';

/**
 * Mainbrace's colours, one role each (docs/visual-guide.md): ink on warm paper, potable-water blue for
 * pipes, vermilion for the thrust, plum for restrained joints, concrete grey. Every coloured thing also
 * has a shape of its own (dash, hatching, tick, arrowhead, symbol), so colour is never the only cue.
 * styles.css repeats these values as custom properties for the panels and the print.
 */
export const PALETTE = {
  paper: '#fbfaf6',
  gridMinor: '#ece9e0',
  gridMajor: '#dcd8cc',
  gridLabel: '#8d897e',
  ink: '#23262b',
  /** potable-water blue, the usual utility convention for water mains */
  pipe: '#1d6fb8',
  pipeSelected: '#0b3d6b',
  thrust: '#c0391b',
  /** restrained joints: the ticks and the dimension line of a restrained zone */
  restraint: '#8b3a7e',
  /** concrete: blocks and trench pads, hatched */
  block: '#5d5b55',
  blockFill: 'rgba(120, 118, 110, 0.16)',
  anchor: '#2f4858',
  pad: '#6d6a5f',
  selection: '#e08a00',
  warning: '#f2c230',
  halo: 'rgba(251, 250, 246, 0.92)',
  rubber: '#d0590b',
} as const;

/** Stroke weights on screen, px (pipes grow with their diameter: `pipeWidth`). */
export const LINE = {
  symbol: 1.5,
  block: 1.1,
  hatch: 0.7,
  /** hatching pitch, px between 45° lines */
  hatchPitch: 5,
  anchor: 1.6,
  thrust: 2.2,
  joint: 2,
  /** half-length of a joint tick across the pipe: past the widest pipe stroke (9 px) */
  jointHalf: 7,
  dimension: 1,
} as const;

/**
 * Label faces: a narrow sans for everything written on the plan (more marks fit, figures stay
 * upright and even, as engineering lettering is), falling back to the system's sans.
 */
export const LABEL_FACE = "'Arial Narrow', 'Liberation Sans Narrow', 'DejaVu Sans Condensed', system-ui, sans-serif";
export const TYPE = {
  /** fitting and tie-in marks */
  mark: `700 12.5px ${LABEL_FACE}`,
  /** forces beside the thrust arrows */
  force: `600 11.5px ${LABEL_FACE}`,
  /** restrained-zone dimensions */
  dimension: `600 11.5px ${LABEL_FACE}`,
  /** grid coordinates */
  grid: `10.5px ${LABEL_FACE}`,
  /** letters inside symbols */
  symbol: `700 9px ${LABEL_FACE}`,
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
