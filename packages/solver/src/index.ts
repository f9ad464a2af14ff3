// The solver's public surface: the project model, the analysis, the schedule, and display units.
export * from './model/projectSchema.js';
export { projectSchema } from './model/project.js';
export { geometryProblems } from './model/crossChecks.js';
export { MIN_PIPE_LENGTH, OVERLAP_ANGLE } from './model/routeRules.js';
export { LIMITS, unusual, type Limit, type LimitId } from './model/limits.js';
export { implausibleInputs } from './model/plausibility.js';
export { nodeCover, nodeGround, nodeOutsideDiameters, pipeLevelFor, coverFor } from './model/groundLevel.js';
export { caseLabel, caseName } from './model/caseLabel.js';
export { blankSheet, sheetOf } from './model/sheet.js';
export { parseProject, parseProjectText, type ParseResult } from './model/parseProject.js';
export { quickParse } from './model/quickParse.js';
export { partProblems, crossProblems, type ProjectList } from './model/partCheck.js';
export { problemText, type Problem } from './model/problems.js';
export { projectJsonSchema } from './model/jsonSchema.js';
export * from './geometry/vector.js';
export * from './units/conversions.js';
export * from './units/format.js';
export * from './units/quantities.js';
export { legsByNode, type Leg } from './network/legs.js';
export { fittingGeometry, needsRestraint, type FittingKind, type FittingGeometry } from './network/fittingKind.js';
export { runLetter, type Run } from './network/runs.js';
export { pressureAt, VACUUM_GAUGE_PRESSURE } from './pressure/nodePressure.js';
export { momentumBalance, type ThrustParts } from './thrust/momentumBalance.js';
export {
  fittingThrust,
  thrustEnvelope,
  worstPerCase,
  type CaseThrust,
  type ThrustEnvelope,
} from './thrust/fittingThrust.js';
export {
  analyse,
  analyseNext,
  analyseProject,
  analyseInSteps,
  type Analysis,
  type FittingAnalysis,
} from './analysis/analyse.js';
export { calculationRecord } from './analysis/calculationRecord.js';
export type { CalcStep, RecordValue } from './analysis/calcRecord.js';
export { nodeSoil, type Restraint } from './restraint/sizeRestraint.js';
export { blockBaseDown } from './restraint/concreteRestraint.js';
export { bearingAtDepth } from './restraint/site.js';
export {
  SOIL_LIBRARY,
  SOIL_KINDS,
  ORDERING_DEPTH,
  findLibrarySoil,
  librarySoilToProject,
  orderingBearing,
  type LibrarySoil,
  type SoilKind,
  type SoilTable,
} from './restraint/soilLibrary.js';
export { rankinePassiveCoefficient, passiveResistance } from './restraint/passiveResistance.js';
export { fittingProfile, type Schedule, type ScheduleFitting } from './schedule/scheduleRows.js';
export { scheduleOf } from './schedule/scheduleOf.js';
export { scheduleCsv } from './schedule/scheduleCsv.js';
export { scheduleTable } from './schedule/scheduleTable.js';
export { scheduleJson, diagnosticJson, JSON_DECIMALS } from './schedule/scheduleJson.js';
export {
  restraintSummary,
  blockText,
  anchorText,
  padText,
  restrainedText,
  restrainedLegText,
  jointsText,
} from './schedule/restraintText.js';
export { layingLengthText, restrainedJointCount, restrainedJointPositions } from './schedule/restrainedJoints.js';
export {
  restraintElements,
  elementName,
  ELEMENT_WORD,
  type RestraintElement,
  type RestraintElementKind,
} from './schedule/restraintElements.js';
export { SCHEDULE_COLUMNS, TABLE_COLUMNS, APP_COLUMNS, type ScheduleColumn } from './schedule/scheduleColumns.js';
export {
  scheduleView,
  scheduleConcrete,
  pickColumns,
  type ScheduleView,
  type ViewColumn,
  type ViewRow,
} from './schedule/scheduleView.js';
export { noteAfterHeading, scheduleNotes, type ScheduleNote } from './schedule/scheduleNotes.js';
export {
  blockTopShown,
  columnNumber,
  columnUnit,
  quantityText,
  readsZero,
  COLUMN_UNITS,
  type ColumnKind,
} from './schedule/columnUnits.js';
export { KIND_NAME, bearingText, compassPoint, fittingTitle, angleText, kindName } from './schedule/fittingNames.js';
export { DIAGNOSTIC_CODES, type CodeSpec } from './diagnostics/codes.js';
export type { CodeMeaning, CodeMeanings } from './diagnostics/codeMeanings.js';
export {
  diagnostic,
  bySeverity,
  uniqueDiagnostics,
  worstSeverity,
  type Diagnostic,
  type DiagnosticCode,
  type Severity,
  type Subject,
} from './diagnostics/diagnostic.js';
export { diagnosticText, type Wording, type WordingContext } from './diagnostics/wording.js';
export { wordingContext, legName, legTarget } from './diagnostics/context.js';
export { REGISTER, provenance, type ProvenanceId } from './provenance/register.js';
export { unverified } from './provenance/unverified.js';
export { notVerifiedText, type ProvenanceEntry, type SourceKind } from './provenance/entry.js';
export { CAUTIONS, PAGE_CAUTIONS } from './schedule/cautions.js';
export { SHORT_CAUTION } from './schedule/shortCaution.js';
export { anchorConcrete, blockConcrete, restraintConcrete } from './schedule/concrete.js';
export * from './schedule/quantities.js';
export { takeOffCsv, takeOffTable } from './schedule/quantitiesText.js';
export * from './schedule/settingOut.js';
export { stationText, positionColumns } from './schedule/stations.js';
export * from './catalog/catalog.js';
export {
  BEDDINGS,
  DEFAULT_BEDDING,
  WRAP_WORDS,
  beddingReference,
  findBedding,
  type Bedding,
} from './catalog/layingConditions.js';
export type { PipeSeries, PipeSize, PressureRating } from './catalog/pipeSeries.js';
export { pipeRating, pipeRatingChecks, caseLimit } from './pressure/pipeRating.js';
export {
  surgeEstimate,
  waveSpeed,
  pipeWaveSpeed,
  joukowsky,
  supportFactor,
  PIPE_ELASTICITY,
  type SurgeEstimate,
  type PipeSurge,
} from './pressure/surge.js';
export { proposeTestPressure, type TestProposal, type TestRule, type TestCriterion } from './pressure/testPressure.js';
export * from './geometry/similarity.js';
export * from './geometry/calibration.js';
