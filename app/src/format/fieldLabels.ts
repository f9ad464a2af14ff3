/**
 * Field labels as the panels show them (CasesPanel, NodeDetails, PipeDetails, ProjectSoils,
 * DesignSettings, BeddingAndWrap), and as a refused value is named (state/refusalWords.ts): one table,
 * so that a message names the field as the screen labels it.
 */
export const CASE_FIELDS = {
  pressure: 'Pressure',
  datumElevation: 'Datum',
  flowFactor: 'Flow factor',
  label: 'Name',
  kind: 'Kind',
} as const;
export const NODE_FIELDS = {
  x: 'East',
  y: 'North',
  elevation: 'Pipe centreline elevation',
  groundLevel: 'Ground level',
  cover: 'Cover to top of pipe',
  soil: 'Soil',
  label: 'Label',
} as const;
export const PIPE_FIELDS = {
  outsideDiameter: 'Outside diameter',
  insideDiameter: 'Inside diameter',
  flow: 'Flow',
  label: 'Label',
} as const;
export const SOIL_FIELDS = {
  bearing: 'Bearing',
  unitWeight: 'Unit weight',
  frictionAngle: 'Friction angle',
  cohesion: 'Cohesion',
  label: 'Name',
  source: 'Source',
} as const;
export const DESIGN_FIELDS = {
  bearingSafetyFactor: 'Safety factor on bearing',
  upliftSafetyFactor: 'Safety factor on uplift',
  restraintSafetyFactor: 'Safety factor on restrained length',
  concreteUnitWeight: 'Concrete unit weight',
  blockDepth: 'Block depth to bearing face',
  groundwaterElevation: 'Highest groundwater elevation',
  layingLength: 'Pipe laying length',
} as const;
