// Routes in and out: CSV surveys and GeoJSON routes become projects; designs go back out as GeoJSON.
// Loaded on demand (the app imports it dynamically, the CLI only for import and export), because the
// CSV and projection libraries it brings are not needed to draw or size a route.
export { importGeoJson, importCsv, importBase, DEFAULT_TOLERANCE, DEFAULT_COVER } from './routeProject.js';
export type { ImportOptions, ImportResult } from './routeProject.js';
export { readCsvTable, guessMapping, SURVEY_UNITS } from './csvSurvey.js';
export type { ColumnMapping, SurveyUnit, SurveyTable } from './csvSurvey.js';
export { defaultPipe, DEFAULT_SERIES, DEFAULT_NOMINAL, type PipeChoice } from './pipeChoice.js';
export { noteText, type ImportNote } from './importNotes.js';
export { localTransverseMercator, projectionOf, type PlanProjection } from './localProjection.js';
export { designGeoJson, type ExportRefusal, type ExportResult } from './geojsonExport.js';
