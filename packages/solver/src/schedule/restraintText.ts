import type { UnitSystem } from '../units/conversions.js';
import { formatDimension } from '../units/format.js';
import { quantityText } from './columnUnits.js';
import type { ScheduleFitting } from './scheduleRows.js';
import { anchorBox, padThickness } from './settingOut.js';

type Block = NonNullable<ScheduleFitting['restraint']['block']>;

const dim = (m: number, units: UnitSystem) => formatDimension(m, units);

/** "0.80 w × 0.75 h × 0.60 t": face width, face height and thickness to the bearing face. */
export const blockText = (b: Block, units: UnitSystem): string =>
  `${dim(b.faceWidth, units)} w × ${dim(b.faceHeight, units)} h × ${dim(b.depth, units)} t`;

/** "1.25 L × 1.25 W × 1.25 H (cube)": an anchor's three dimensions, "cube" while sizing gives only a volume. */
export function anchorText(anchor: object, units: UnitSystem): string {
  const b = anchorBox(anchor);
  return `${dim(b.length, units)} L × ${dim(b.width, units)} W × ${dim(b.height, units)} H${b.cube ? ' (cube)' : ''}`;
}

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

/** What holds the fitting, in one line of display units: what a crew builds. */
export function restraintSummary(f: ScheduleFitting, units: UnitSystem, step: number): string {
  const r = f.restraint;
  const parts: string[] = [];
  if (r.block) parts.push(`block ${blockText(r.block, units)}`);
  if (r.reverseBlock) parts.push(`opposite block ${blockText(r.reverseBlock, units)}`);
  if (r.anchor) parts.push(`anchor ${anchorText(r.anchor, units)}`);
  if (r.trenchBottom) parts.push(`bottom pad ${padText(r.trenchBottom, step, units)}`);
  if (r.restrainedLegs.length) parts.push(`restrain ${restrainedText(f, units)}`);
  return parts.length ? parts.join('; ') : '—';
}
