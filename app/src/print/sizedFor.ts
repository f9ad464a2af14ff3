import { quantityText, type Project, type ScheduleFitting, type UnitSystem } from '@mainbrace/solver';
import { show } from '../format/quantity.js';

/**
 * What a crew page's restraints were sized for, in one line under its title: the pressure cases (the
 * test pressure a crew must not exceed among them) and the soil each block, anchor or pad bears on with
 * its allowable bearing, so that a crew meeting softer ground than assumed knows to stop and ask.
 */
export function sizedForLine(project: Project, fittings: readonly ScheduleFitting[], units: UnitSystem): string {
  const cases = project.loadCases
    .map(
      (c) =>
        `${c.label ?? c.id} ${quantityText(c.pressure, 'pressure', units)}` +
        (c.datumElevation === undefined ? '' : ` at level ${quantityText(c.datumElevation, 'level', units)}`),
    )
    .join(', ');
  const bySoil = new Map<string, string[]>();
  for (const f of fittings) {
    const r = f.restraint;
    if (!r.block && !r.anchor && !r.trenchBottom) continue;
    bySoil.set(f.soil, [...(bySoil.get(f.soil) ?? []), f.mark]);
  }
  const soils = [...bySoil].map(([id, marks]) => {
    const soil = project.soils.find((s) => s.id === id);
    const name = soil ? `${soil.label}, ${show(soil.bearing, 'stress', units)} allowable` : id;
    // one soil under all of the page's concrete needs no marks
    return bySoil.size > 1 ? `${name} (${marks.join(', ')})` : name;
  });
  return `Sized for: ${cases} (gauge)${soils.length ? `. Concrete bears on: ${soils.join('; ')}` : ''}.`;
}
