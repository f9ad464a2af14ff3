import {
  bearingAtDepth,
  quantityText,
  type Project,
  type ScheduleFitting,
  type Soil,
  type UnitSystem,
} from '@mainbrace/solver';
import { show } from '../format/quantity.js';

/**
 * Pa, the allowable bearing a fitting's concrete was sized on: a block's at its face centre (the soil's
 * bearing and its rise with depth, as the block sizing takes it), a pad's or an anchor's the vertical
 * bearing; null for restrained joints alone.
 */
function sizedOn(f: ScheduleFitting, soil: Soil): number | null {
  const r = f.restraint;
  // As restraint/concreteRestraint.ts sizes them: a block at its face centre, a pad or an anchor on the
  // vertical bearing.
  if (r.block) return bearingAtDepth(soil, f.cover, Math.max(...f.pipes.map((p) => p.outsideDiameter)));
  return r.anchor || r.trenchBottom ? (soil.verticalBearing ?? soil.bearing) : null;
}

/**
 * What a crew page's restraints were sized for, in one line under its title: the pressure cases (the
 * test pressure a crew must not exceed among them) and the soil assumed at each restrained fitting with
 * the allowable bearing its concrete was sized on, so that a crew meeting softer ground knows to stop.
 */
export function sizedForLine(project: Project, fittings: readonly ScheduleFitting[], units: UnitSystem): string {
  const cases = project.loadCases
    .map(
      (c) =>
        `${c.label ?? c.id} ${quantityText(c.pressure, 'pressure', units)}` +
        (c.datumElevation === undefined ? '' : ` at level ${quantityText(c.datumElevation, 'level', units)}`),
    )
    .join(', ');
  const bySoil = new Map<string, { soil: Soil | undefined; marks: string[]; bearings: number[] }>();
  for (const f of fittings) {
    const r = f.restraint;
    if (!r.block && !r.anchor && !r.trenchBottom && r.restrainedLegs.length === 0) continue;
    let entry = bySoil.get(f.soil);
    if (!entry)
      bySoil.set(f.soil, (entry = { soil: project.soils.find((s) => s.id === f.soil), marks: [], bearings: [] }));
    entry.marks.push(f.mark);
    const on = entry.soil ? sizedOn(f, entry.soil) : null;
    if (on !== null) entry.bearings.push(on);
  }
  const soils = [...bySoil].map(([id, { soil, marks, bearings }]) => {
    const [low, high] = [Math.min(...bearings), Math.max(...bearings)].map((b) => show(b, 'stress', units));
    const bearing = bearings.length ? `, ${low === high ? low : `${low} to ${high}`} allowable` : '';
    const name = `${soil?.label ?? id}${bearing}`;
    // one soil at all of the page's restrained fittings needs no marks
    return bySoil.size > 1 ? `${name} (${marks.join(', ')})` : name;
  });
  return `Sized for gauge pressures ${cases}${soils.length ? `. Soil assumed: ${soils.join('; ')}` : ''}.`;
}
