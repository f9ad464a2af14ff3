import { z } from 'zod';
import { VALUES } from '../provenance/registerValues.js';
import type { Dimension } from '../units/conversions.js';
import { LIMITS, type Limit, type LimitId } from './limits.js';
import { CASE_KINDS, ENCASEMENTS, END_CONDITIONS, MATERIALS, RESTRAINT_METHODS } from './choices.js';

/**
 * The project file (shared design: project-format.md, v1). Stored quantities are SI base units;
 * angles are degrees. Optional fields receive their documented defaults on parse.
 */

const id = z.string().min(1, { error: 'must be a non-empty id' }).max(64, { error: 'must be at most 64 characters' });
const finite = () => z.number().finite();

const SI_UNIT: Partial<Record<Dimension, string>> = {
  pressure: 'Pa',
  stress: 'Pa',
  elevation: 'm',
  length: 'm',
  diameter: 'm',
  flow: 'm³/s',
  density: 'kg/m³',
  unitWeight: 'N/m³',
  angle: '°',
  stressGradient: 'Pa/m',
  forcePerLength: 'N/m',
};

/** A number within its hard plausibility range (model/limits.ts); the message gives the bound in SI. */
function limited(id: LimitId) {
  const l: Limit = LIMITS[id];
  const unit = SI_UNIT[l.kind];
  const v = (x: number) => `${x}${unit ? (unit === '°' ? '°' : ` ${unit}`) : ''}`;
  let n = finite();
  n = l.hard.exclusiveMin
    ? n.gt(l.hard.min, { error: `must be more than ${v(l.hard.min)}` })
    : n.gte(l.hard.min, { error: `must be at least ${v(l.hard.min)}` });
  if (Number.isFinite(l.hard.max)) n = n.lte(l.hard.max, { error: `must be at most ${v(l.hard.max)}` });
  return n;
}
/** Default safety factor on bearing, uplift and restrained length (register: design.safety-factor). */
const SF = VALUES['design.safety-factor'];
const safetyFactor = () => limited('safetyFactor');

// The choice lists live in a module without zod, so that a screen offering them loads no schema code.
export { CASE_KINDS, ENCASEMENTS, END_CONDITIONS, MATERIALS, RESTRAINT_METHODS };

export const waterSchema = z.strictObject({
  /** kg/m³; water at 20 °C (register: water.density) */
  density: limited('density').default(VALUES['water.density']),
});

export const designSchema = z.strictObject({
  thrustArea: z.enum(['outside', 'inside']).default('outside'),
  bearingSafetyFactor: safetyFactor().default(SF),
  upliftSafetyFactor: safetyFactor().default(SF),
  restraintSafetyFactor: safetyFactor().default(SF),
  /** N/m³; 23,600 ≈ 150 lb/ft³ normal-weight concrete (common practice); at least 15 kN/m³ so that it sinks */
  concreteUnitWeight: limited('concreteUnitWeight').default(VALUES['concrete.unit-weight']),
  /** m, or null when groundwater lies below every block */
  groundwaterElevation: limited('elevation').nullable().default(null),
  /** m, thickness of a bearing block from the fitting to its bearing face (concrete volume estimate) */
  blockDepth: limited('blockDepth').default(VALUES['design.block-depth']),
  /** m, trench width for the face-width check, or null for OD + 2 × 0.3 m (common practice) */
  trenchWidth: limited('trenchWidth').nullable().default(null),
  /**
   * m, the construction step built dimensions are rounded up to; the same whatever the display units
   * (50 mm by default; a US office may set 2 in = 0.0508 m)
   */
  dimensionStep: limited('dimensionStep').default(VALUES['design.dimension-step']),
  /**
   * m, length of one pipe between joints: restrained joints are counted and drawn from it, the first at
   * the fitting. 6 m is common practice (EN 545 pipes are made 6 m long; 20 ft pipes are 6.1 m).
   */
  layingLength: limited('layingLength').default(6),
  /**
   * fraction added to the concrete take-off for waste (0.1 = 10 %); optional so that files and code
   * written before it keep their shape: absent means the register's default (quantities.concrete-waste)
   */
  concreteWaste: limited('concreteWaste').optional(),
});

export const CHAINAGE_STYLES = ['chainage', 'stations', 'both'] as const;

const titleField = (max: number) =>
  z
    .string()
    .max(max, { error: `must be at most ${max} characters` })
    .default('');

/**
 * The drawing sheet: the title block a utility expects (editable project fields, printed on every
 * page) and how positions along a run are written. Optional as a whole so that earlier files keep
 * their shape; its fields default to empty.
 */
export const sheetSchema = z.strictObject({
  drawingNumber: titleField(40),
  revision: titleField(12),
  /** the date of issue as the office writes it (free text: 2026-12-03, 3 Dec 2026) */
  date: titleField(30),
  drawnBy: titleField(40),
  checkedBy: titleField(40),
  approvedBy: titleField(40),
  /**
   * positions along a run: chainage (m or ft from the run's start), stations (9+31.8: 100 ft stations
   * in US units, 1 km stations in SI) or both
   */
  chainageStyle: z.enum(CHAINAGE_STYLES).default('chainage'),
});

export const loadCaseSchema = z.strictObject({
  id,
  label: z.string().max(80).optional(),
  /** what the case stands for; guides the cases panel and the test-pressure helper */
  kind: z.enum(CASE_KINDS).optional(),
  /** Pa, gauge, at datumElevation (or at every node when no datum is given) */
  pressure: limited('pressure'),
  /** m */
  datumElevation: limited('elevation').optional(),
  /** multiplies every pipe's flow; 0 = no flow (field test) */
  flowFactor: limited('flowFactor').default(1),
});

export const soilSchema = z.strictObject({
  id,
  label: z.string().max(80).optional(),
  /** Pa, allowable horizontal bearing of undisturbed soil; 0 for muck/peat */
  bearing: limited('bearing'),
  /** N/m³; at least that of water, so that a submerged soil still weighs something */
  unitWeight: limited('soilUnitWeight').default(18000),
  /** degrees */
  frictionAngle: limited('frictionAngle').default(30),
  /** Pa */
  cohesion: limited('cohesion').default(0),
  /** Pa/m, allowable lateral bearing gained per metre of depth to the block centroid (IBC 1806.2 style) */
  bearingPerDepth: limited('bearingPerDepth').optional(),
  /** Pa, allowable bearing of the trench bottom for downward thrust; defaults to `bearing` */
  verticalBearing: limited('bearing').optional(),
  /** m, least cover over the pipe for which the bearing value holds */
  minCover: limited('minCover').optional(),
  /** pipe-to-soil friction angle as a fraction of the soil's, f_φ in δ = f_φ·φ (restrained joints) */
  pipeFrictionRatio: finite()
    .gt(0, { error: 'must be greater than 0' })
    .lte(1, { error: 'must be at most 1' })
    .optional(),
  /** pipe-to-soil adhesion as a fraction of the soil's cohesion, f_c in C_p = f_c·C (restrained joints) */
  pipeAdhesionRatio: limited('ratio').optional(),
  /** where the values come from, shown beside the soil */
  source: z.string().max(400).optional(),
});

export const nodeSchema = z.strictObject({
  id,
  /** m, plan east */
  x: limited('coordinate'),
  /** m, plan north */
  y: limited('coordinate'),
  /** m, pipe centreline elevation */
  elevation: limited('elevation'),
  /** m, ground surface to top of pipe; derived from groundLevel when the node has one */
  cover: limited('cover').default(1.2),
  /**
   * m, ground surface elevation (a survey level), optional. With it the pipe centreline stays where
   * `elevation` puts it and the cover is groundLevel − elevation − OD/2 (model/groundLevel.ts).
   */
  groundLevel: limited('elevation').optional(),
  soil: id.optional(),
  end: z.enum(END_CONDITIONS).default('cap'),
  valve: z.boolean().default(false),
  /** how the fitting is held: concrete (bearing block and gravity anchor) or restrained joints */
  restraint: z.enum(RESTRAINT_METHODS).default('block'),
  label: z.string().max(80).optional(),
});

export const pipeSchema = z.strictObject({
  id,
  from: id,
  to: id,
  /** m */
  outsideDiameter: limited('outsideDiameter'),
  /** m */
  insideDiameter: limited('insideDiameter'),
  /** m³/s, positive from `from` to `to` */
  flow: limited('flow').default(0),
  material: z.enum(MATERIALS).default('ductile-iron'),
  /** catalog series id and nominal size the diameters were taken from, if any */
  series: z.string().max(40).optional(),
  nominal: z.string().max(20).optional(),
  /** laying condition 1–5 of AWWA C150/C151, for the restrained-joint bearing term */
  trenchType: z
    .number()
    .int({ error: 'must be a whole number 1 to 5' })
    .gte(1, { error: 'must be 1 to 5' })
    .lte(5, { error: 'must be 1 to 5' })
    .optional(),
  /** polyethylene encasement (AWWA C105) lowers pipe–soil friction */
  encasement: z.enum(ENCASEMENTS).optional(),
  /** N/m, pipe self-weight; defaults to the material density times the wall area */
  weightPerLength: limited('weightPerLength').optional(),
  label: z.string().max(80).optional(),
});

export const UNDERLAY_MEDIA_TYPES = ['image/png', 'image/jpeg'] as const;

/** Two points picked on the image, px from its top-left corner (u right, v down). */
const imagePoint = z.strictObject({ u: finite(), v: finite() });

/**
 * A site-plan image under the route, placed on the plan by a similarity transform (scale, rotation,
 * position) so that the route can be traced over it. The solver ignores it.
 */
export const underlaySchema = z
  .strictObject({
    /** the file name the image came from */
    name: z.string().max(200),
    mediaType: z.enum(UNDERLAY_MEDIA_TYPES),
    /** px */
    width: z.number().int({ error: 'must be a whole number of pixels' }).gte(1).lte(50000),
    height: z.number().int({ error: 'must be a whole number of pixels' }).gte(1).lte(50000),
    /** the image itself, base64 (a small image is kept in the file) */
    dataUrl: z
      .string()
      .regex(/^data:image\/(png|jpeg);base64,[A-Za-z0-9+/=]+$/, {
        error: 'must be a data URL of a PNG or JPEG image (data:image/png;base64,...)',
      })
      .optional(),
    /** key of the image in the browser's storage beside the project (a large image is not in the file) */
    storageKey: z.string().min(1).max(100).optional(),
    /** m, plan position (east, north) of the image's top-left corner */
    x: limited('coordinate'),
    y: limited('coordinate'),
    /** m on the plan per image pixel */
    metresPerPixel: finite().gt(0, { error: 'must be more than 0' }).lte(1000, { error: 'must be at most 1000' }),
    /** degrees counterclockwise from plan east to the image's rows */
    rotation: finite().gte(-360).lte(360).default(0),
    /** 0 (invisible) to 1 (opaque) */
    opacity: finite().gte(0, { error: 'must be 0 to 1' }).lte(1, { error: 'must be 0 to 1' }).default(0.5),
    /** a locked underlay cannot be moved or calibrated until unlocked */
    locked: z.boolean().default(false),
    /** how the placement was found, so that it can be shown and checked */
    calibration: z
      .strictObject({
        method: z.enum(['distance', 'coordinates']),
        points: z.tuple([imagePoint, imagePoint]),
        /** m, the known distance between the two points (method "distance") */
        distance: finite().gt(0).optional(),
        /** m, the known plan coordinates of the two points (method "coordinates") */
        coordinates: z
          .tuple([z.strictObject({ x: finite(), y: finite() }), z.strictObject({ x: finite(), y: finite() })])
          .optional(),
      })
      .optional(),
  })
  .superRefine((u, ctx) => {
    if ((u.dataUrl === undefined) === (u.storageKey === undefined))
      ctx.addIssue({
        code: 'custom',
        path: ['dataUrl'],
        message: 'give exactly one of dataUrl (the image in the file) or storageKey (the image in browser storage)',
      });
  });

export const projectShape = z.strictObject({
  format: z.literal('mainbrace-project', { error: 'must be exactly "mainbrace-project"' }),
  version: z.literal(1, { error: 'must be 1 (the only version this program reads)' }),
  name: z.string().max(200).default('Untitled main'),
  units: z.enum(['us', 'si']).default('si'),
  water: waterSchema.default({ density: VALUES['water.density'] }),
  design: designSchema.default(() => designSchema.parse({})),
  loadCases: z.array(loadCaseSchema).min(1, { error: 'must have at least one load case' }),
  soils: z.array(soilSchema).min(1, { error: 'must have at least one soil' }),
  defaultSoil: id.optional(),
  nodes: z.array(nodeSchema).default([]),
  pipes: z.array(pipeSchema).default([]),
  /** a site-plan image to trace the route over (optional) */
  underlay: underlaySchema.optional(),
  sheet: sheetSchema.optional(),
  /**
   * where the plan lies on the earth, optional: x and y are metres in this projection of WGS 84, so the
   * design can be exported as GeoJSON longitude/latitude (project-format.md, "Georeference")
   */
  georeference: z
    .strictObject({
      /** a proj4 definition, such as the local transverse Mercator an import made */
      proj4: z.string().min(1, { error: 'must be a proj4 definition' }).max(400),
    })
    .optional(),
});

export type Project = z.output<typeof projectShape>;
export type ProjectInput = z.input<typeof projectShape>;
export type LoadCase = Project['loadCases'][number];
export type Soil = Project['soils'][number];
export type ProjectNode = Project['nodes'][number];
export type Pipe = Project['pipes'][number];
export type Design = Project['design'];
export type Sheet = z.output<typeof sheetSchema>;
export type ChainageStyle = (typeof CHAINAGE_STYLES)[number];
export type Material = (typeof MATERIALS)[number];
export type Underlay = NonNullable<Project['underlay']>;
export type RestraintMethod = (typeof RESTRAINT_METHODS)[number];
