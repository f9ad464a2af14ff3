import { useState } from 'react';
import { SOIL_KINDS, SOIL_LIBRARY, librarySoilToProject, type LibrarySoil, type UnitSystem } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { nextId } from '../state/documentEdits.js';
import { show } from '../format/quantity.js';

/** "47.9 kPa", or "23.6 kPa per m of depth" for a class whose bearing grows with depth. */
export function bearingWords(s: LibrarySoil, u: UnitSystem): string {
  if (s.bearingPerDepth && s.bearing === 0) return `${show(s.bearingPerDepth, 'stressGradient', u)} of depth`;
  return show(s.bearing, 'stress', u);
}

/**
 * The built-in soil classes to copy from: our own class names grouped by kind and ordered by bearing,
 * each with its bearing and the table it comes from beside it; the picked class shows its full source.
 */
export function SoilClassPicker() {
  const project = useApp((s) => s.project);
  const u = useApp((s) => s.units);
  const actions = useActions();
  const [pick, setPick] = useState(SOIL_LIBRARY[0]!.id);
  const picked = SOIL_LIBRARY.find((s) => s.id === pick)!;
  const kind = SOIL_KINDS.find((k) => k.kind === picked.kind)!;
  const add = () => {
    const ids = project.soils.map((s) => s.id);
    const id = ids.includes(picked.id) ? nextId(`${picked.id}-`, ids) : picked.id;
    actions.addSoil(librarySoilToProject(picked, id));
  };
  return (
    <div className="soil-picker" data-testid="soil-picker">
      <label htmlFor="soil-class">Add a soil class</label>
      <div className="soil-picker-row">
        <select id="soil-class" value={pick} onChange={(e) => setPick(e.target.value)} data-testid="soil-library">
          {SOIL_KINDS.map((k) => (
            <optgroup key={k.kind} label={`${k.name} — ${k.note}`}>
              {SOIL_LIBRARY.filter((s) => s.kind === k.kind).map((s) => (
                <option key={s.id} value={s.id}>
                  {s.label} · {bearingWords(s, u)} · {s.sourceShort}
                </option>
              ))}
            </optgroup>
          ))}
        </select>
        <button onClick={add} data-testid="add-soil">
          Add to project
        </button>
      </div>
      <dl className="soil-card" aria-label={`Soil class ${picked.label}`}>
        <dt>Kind</dt>
        <dd>
          {kind.name} ({kind.note})
        </dd>
        <dt>Bearing</dt>
        <dd>
          {bearingWords(picked, u)}
          {picked.minCover ? `, with more than ${show(picked.minCover, 'length', u)} of cover` : ''}
        </dd>
        <dt>Source</dt>
        <dd className="soil-source" data-testid="soil-class-source">
          {picked.source}
        </dd>
      </dl>
    </div>
  );
}
