import type { UnitSystem } from '../units/conversions.js';
import { formatDimension } from '../units/format.js';
import { quantityText } from './columnUnits.js';
import type { ScheduleFitting } from './scheduleRows.js';
import { planBearing } from '../geometry/vector.js';
import { bearingText } from './fittingNames.js';
import { padThickness } from './settingOut.js';
import { anchorConcrete } from './concrete.js';
import { blockBaseDown } from '../restraint/concreteRestraint.js';
import { norm } from '../geometry/vector.js';

type Block = NonNullable<ScheduleFitting['restraint']['block']>;

const dim = (m: number, units: UnitSystem) => formatDimension(m, units);

/** "0.80 w × 0.75 h × 0.60 t": face width, face height and thickness to the bearing face. */
export const blockText = (b: Block, units: UnitSystem): string =>
  `${dim(b.faceWidth, units)} w × ${dim(b.faceHeight, units)} h × ${dim(b.depth, units)} t`;

type Anchor = NonNullable<ScheduleFitting['restraint']['anchor']>;

/** "1.25 l × 1.25 w × 1.25 h": plan length along the pipe, width across it, height. */
export const anchorText = (a: Anchor, units: UnitSystem): string =>
  `${dim(a.length, units)} l × ${dim(a.width, units)} w × ${dim(a.height, units)} h`;

/** "0.90 w × 0.70 l × 0.15 t": a trench-bottom pad across the trench, along the pipe, and thick. */
export const padText = (p: { width: number; length: number }, step: number, units: UnitSystem): string =>
  `${dim(p.width, units)} w × ${dim(p.length, units)} l × ${dim(padThickness(step), units)} t`;

type RestrainedLeg = ScheduleFitting['restraint']['restrainedLegs'][number];

/** One restrained leg, named by the fitting it runs toward, with its joints: "12.5 m toward A4 (3 joints)". */
export const restrainedLegText = (l: RestrainedLeg, units: UnitSystem): string =>
  `${quantityText(l.length, 'restrained', units)} ${l.toward ? `toward ${l.toward}` : 'to the end'} (${jointsText(l.joints)})`;

/** "1 joint", "3 joints". */
export const jointsText = (n: number): string => `${n} joint${n === 1 ? '' : 's'}`;

/** Restrained lengths per leg, named by the fitting each runs toward: "12.5 m toward A4 (3 joints)". */
export function restrainedText(f: ScheduleFitting, units: UnitSystem): string {
  return f.restraint.restrainedLegs.map((l) => restrainedLegText(l, units)).join(', ');
}

const force = (n: number, units: UnitSystem) => quantityText(n, 'force', units);

/**
 * What a block bears, and which way: "bears 113° SE, 2.48 kN" — horizontally, toward the outside of
 * the bend (the way the thrust pushes), with "and holds 1.2 kN up" where its weight holds an uplift.
 */
export const blockForceText = (b: Block, units: UnitSystem, baseDown = 0): string =>
  `bears ${bearingText(planBearing(b.direction))}, ${force(b.thrust, units)}` +
  (b.upwardThrust > 0 ? ` and holds ${force(b.upwardThrust, units)} up` : '') +
  (baseDown > 0 ? ` and ${force(baseDown, units)} down on its base` : '');

/** N the fitting's main block bears down on its base (no pad sized: the base is enough), else 0. */
export const baseDownOf = (f: ScheduleFitting): number =>
  blockBaseDown(f.restraint, f.downwardThrust, norm(f.thrust), f.diagnostics);

/** What an anchor holds: "holds 16.5 kN up" and, where its base friction takes it, the horizontal thrust. */
export const anchorForceText = (a: Anchor, units: UnitSystem): string =>
  `holds ${force(a.upwardThrust, units)} up` +
  (a.horizontalThrust > 0 ? ` and ${force(a.horizontalThrust, units)} sideways by base friction` : '');

/** What a trench-bottom pad bears: "bears 2.1 kN down". */
export const padForceText = (downward: number, units: UnitSystem): string => `bears ${force(downward, units)} down`;

/**
 * What holds the fitting, in one line of display units: what a crew builds, each element with its own
 * force and the way it bears (block: horizontal, toward the outside of the bend; anchor: up; pad: down).
 */
export function restraintSummary(f: ScheduleFitting, units: UnitSystem, step: number): string {
  const r = f.restraint;
  const parts: string[] = [];
  if (r.block) parts.push(`block ${blockText(r.block, units)} ${blockForceText(r.block, units, baseDownOf(f))}`);
  if (r.reverseBlock)
    parts.push(`opposite block ${blockText(r.reverseBlock, units)} ${blockForceText(r.reverseBlock, units)}`);
  if (r.anchor)
    parts.push(
      `anchor ${anchorText(r.anchor, units)}, ${quantityText(anchorConcrete(r.anchor, units), 'volume', units)}, ${anchorForceText(r.anchor, units)}`,
    );
  if (r.trenchBottom)
    parts.push(`bottom pad ${padText(r.trenchBottom, step, units)} ${padForceText(f.downwardThrust, units)}`);
  if (r.restrainedLegs.length) parts.push(`restrain ${restrainedText(f, units)}`);
  // A row a crew reads alone (a black-and-white print, a filtered CSV) says so when it must not be built.
  if (f.diagnostics.some((d) => d.severity === 'error'))
    return `NOT ADEQUATE (see the notes): ${parts.length ? parts.join('; ') : 'no restraint sized'}`;
  return parts.length ? parts.join('; ') : '—';
}
