import type { Dimension } from '../units/conversions.js';
import type { ProvenanceId } from '../provenance/register.js';

/** One named value in a calculation, SI inside; the front ends format it in display units. */
export interface RecordValue {
  symbol: string;
  label: string;
  /** SI value */
  value: number;
  dimension: Dimension;
  /** where the value comes from: the project, a table, a default, or "computed" */
  source?: string;
}

/** One step of a fitting's calculation: the formula, what went in, what came out. */
export interface CalcStep {
  title: string;
  formula: string;
  inputs: RecordValue[];
  result: RecordValue;
  /** the published source of the formula */
  reference: string;
}

/**
 * A step as the sizing writes it when its formula is a register entry: the reference (the entry's words,
 * "not verified against …" where it was not read in its source) is worded when the record is read
 * (analysis/calculationRecord.ts), so that sizing never loads the register's words.
 */
export type RegisterStep = Omit<CalcStep, 'reference'> & { basis: ProvenanceId };

/** A step of the record as the sizing writes it. */
export type SizingStep = CalcStep | RegisterStep;

export const value = (symbol: string, label: string, v: number, dimension: Dimension, source?: string): RecordValue =>
  source === undefined ? { symbol, label, value: v, dimension } : { symbol, label, value: v, dimension, source };
