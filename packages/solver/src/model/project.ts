import { projectShape } from './projectSchema.js';
import { crossCheck } from './crossChecks.js';

/** The whole project file: field shapes and cross-field checks. */
export const projectSchema = projectShape.superRefine(crossCheck);
