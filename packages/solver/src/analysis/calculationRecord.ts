import type { Project } from '../model/projectSchema.js';
import { sizeRestraint } from '../restraint/sizeRestraint.js';
import { thrustSteps } from './thrustSteps.js';
import type { CalcStep, SizingStep } from './calcRecord.js';
import { REGISTER } from '../provenance/register.js';
import { notVerifiedText } from '../provenance/entry.js';
import type { FittingAnalysis } from './analyse.js';

const records = new WeakMap<FittingAnalysis, CalcStep[]>();

/** A step with its reference in words: a register entry's quantity and source, or why it is not verified. */
function wordedStep(step: SizingStep): CalcStep {
  if (!('basis' in step)) return step;
  const { basis, ...rest } = step;
  const e = REGISTER[basis];
  return { ...rest, reference: e.verified ? `${e.quantity} (${e.source})` : `${e.quantity}, ${notVerifiedText(e)}` };
}

/**
 * A fitting's calculation record — thrust, then restraint — built when first read by sizing the
 * fitting again with its record (the schedule never pays for it).
 */
export function calculationRecord(project: Project, f: FittingAnalysis): CalcStep[] {
  let r = records.get(f);
  if (!r) {
    const restraint = sizeRestraint(project, f.node, f.legs, f.geometry, f.envelope, true);
    r = [...thrustSteps(project, f.node, f.legs, f.envelope.governing), ...restraint.steps.map(wordedStep)];
    records.set(f, r);
  }
  return r;
}
