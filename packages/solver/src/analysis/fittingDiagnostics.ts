import { norm } from '../geometry/vector.js';
import type { ProjectNode } from '../model/projectSchema.js';
import type { Leg } from '../network/legs.js';
import {
  RUN_TOLERANCE,
  nearestStandardBend,
  standardBendFor,
  runTurn,
  type FittingGeometry,
} from '../network/fittingKind.js';
import type { CaseThrust, ThrustEnvelope } from '../thrust/fittingThrust.js';
import type { Restraint } from '../restraint/sizeRestraint.js';
import { VACUUM_GAUGE_PRESSURE } from '../pressure/nodePressure.js';
import type { CasePressures } from './thrustSums.js';
import { diagnostic, uniqueDiagnostics, type Diagnostic } from '../diagnostics/diagnostic.js';

function negativePressure(node: string, caseId: string, pressure: number, out: Diagnostic[]): void {
  if (pressure >= 0) return;
  const code = pressure <= VACUUM_GAUGE_PRESSURE + 1e-6 ? 'pressure.vapour-floor' : 'pressure.below-zero';
  out.push(diagnostic(code, { node, case: caseId }, { pressure }));
}

/**
 * Water in equals water out at a joint (continuity): a node whose pipes' flows do not balance, or a
 * cap with flow into it, has a flow typed wrong somewhere. Tie-ins and free ends pass water on.
 */
function flowImbalance(node: string, legs: readonly Leg[], geometry: FittingGeometry): Diagnostic | null {
  if (geometry.kind === 'tie-in' || legs.length === 0) return null;
  let net = 0;
  let largest = 0;
  for (const l of legs) {
    net += l.outflow;
    largest = Math.max(largest, Math.abs(l.outflow));
  }
  if (Math.abs(net) <= 1e-6 + 0.01 * largest) return null;
  return geometry.kind === 'dead-end'
    ? diagnostic('flow.into-cap', { node }, { flow: Math.abs(net) })
    : diagnostic('flow.unbalanced', { node }, { net });
}

/**
 * A bend no standard fitting makes: more than the straight-joint tolerance from every standard angle
 * (joints take up that much). The nearest standard bend is named, none under half the smallest.
 */
function oddBend(node: string, g: FittingGeometry): Diagnostic | null {
  if ((g.kind !== 'bend' && g.kind !== 'reducing-bend') || g.deflection === null) return null;
  const angle = g.deflection;
  if (standardBendFor(angle) !== null) return null;
  const nearest = nearestStandardBend(angle);
  return diagnostic('fitting.odd-bend', { node }, nearest === 0 ? { angle } : { angle, nearest });
}

/** A fitting's findings, most severe first: its inputs, its pressures, its restraint, its flows, its valve. */
export function fittingDiagnostics(
  node: ProjectNode,
  legs: readonly Leg[],
  geometry: FittingGeometry,
  /** one state per case, or each case's pressure read without making the states (thrustSums.ts) */
  cases: readonly CaseThrust[] | CasePressures,
  envelope: ThrustEnvelope,
  restraint: Restraint,
  inputs: readonly Diagnostic[],
): Diagnostic[] {
  const found: Diagnostic[] = [...inputs];
  if (typeof cases === 'function') cases((caseId, pressure) => negativePressure(node.id, caseId, pressure, found));
  else for (const c of cases) negativePressure(node.id, c.caseId, c.pressure, found);
  for (const d of restraint.diagnostics) found.push(d);
  const unbalanced = flowImbalance(node.id, legs, geometry);
  if (unbalanced) found.push(unbalanced);
  if (node.valve && geometry.kind === 'valve') found.push(diagnostic('valve.both-ways', { node: node.id }));
  else if (node.valve) found.push(diagnostic('valve.flag-ignored', { node: node.id }));
  if (legs.length > 4) found.push(diagnostic('fitting.many-pipes', { node: node.id }));
  const odd = oddBend(node.id, geometry);
  if (odd) found.push(odd);
  const turn = runTurn(legs, geometry);
  if (turn !== null && turn > RUN_TOLERANCE) found.push(diagnostic('fitting.bent-run', { node: node.id }, { turn }));
  if (norm(envelope.governing.total) === 0) found.push(diagnostic('thrust.none', { node: node.id }));
  // No findings (most fittings): one shared empty list, not one kept per fitting.
  return found.length ? uniqueDiagnostics(found) : NO_FINDINGS;
}

const NO_FINDINGS = Object.freeze([]) as unknown as Diagnostic[];
