import type { Sheet } from './projectSchema.js';

/** The title block as the schema fills it in when a file has none (no schema library needed to read it). */
export const blankSheet = (): Sheet => ({
  drawingNumber: '',
  revision: '',
  date: '',
  drawnBy: '',
  checkedBy: '',
  approvedBy: '',
  chainageStyle: 'chainage',
});

/** A project's title block with every field present. */
export const sheetOf = (sheet: Partial<Sheet> | undefined): Sheet => ({ ...blankSheet(), ...sheet });
