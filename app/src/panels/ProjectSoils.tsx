import { LIMITS, type Soil } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { NumberField } from './NumberField.js';
import { show } from '../format/quantity.js';
import { SOIL_FIELDS } from '../format/fieldLabels.js';
import { withSourceKept } from '../state/soilSource.js';

/** The project's own soils: values the user may change, each with its source beside it. */
export function ProjectSoils() {
  const project = useApp((s) => s.project);
  const u = useApp((s) => s.units);
  const actions = useActions();
  // a value changed away from what the source vouched for flags the source (soilSource.ts)
  const setSoil = (id: string, patch: Partial<Soil>) =>
    actions.updateSoil(
      id,
      withSourceKept(
        project.soils.find((s) => s.id === id)!,
        patch,
      ),
    );
  return (
    <table className="edit-table soils-table" data-testid="soils-table">
      <thead>
        <tr>
          <th>Soil</th>
          <th>Horizontal bearing</th>
          <th>Unit weight</th>
          <th>Friction angle</th>
          <th>Cohesion</th>
          <th>Source</th>
          <th>Default</th>
          <th />
        </tr>
      </thead>
      <tbody>
        {project.soils.map((s) => (
          <tr key={s.id}>
            <td>
              <input
                aria-label={`${SOIL_FIELDS.label} of soil ${s.id}`}
                value={s.label ?? ''}
                placeholder={s.id}
                maxLength={80}
                onChange={(e) => setSoil(s.id, { label: e.target.value || undefined })}
              />
            </td>
            <td>
              <NumberField
                label={`${SOIL_FIELDS.bearing} of ${s.label ?? s.id}`}
                value={s.bearing}
                dimension="stress"
                units={u}
                min={LIMITS.bearing.hard.min}
                max={LIMITS.bearing.hard.max}
                onCommit={(bearing) => setSoil(s.id, { bearing })}
                hint={s.bearingPerDepth ? `+ ${show(s.bearingPerDepth, 'stressGradient', u)} of depth` : undefined}
              />
            </td>
            <td>
              <NumberField
                label={`${SOIL_FIELDS.unitWeight} of ${s.label ?? s.id}`}
                value={s.unitWeight}
                dimension="unitWeight"
                units={u}
                min={LIMITS.soilUnitWeight.hard.min}
                max={LIMITS.soilUnitWeight.hard.max}
                onCommit={(unitWeight) => setSoil(s.id, { unitWeight })}
              />
            </td>
            <td>
              <NumberField
                label={`${SOIL_FIELDS.frictionAngle} of ${s.label ?? s.id}`}
                value={s.frictionAngle}
                dimension="angle"
                units={u}
                min={LIMITS.frictionAngle.hard.min}
                max={LIMITS.frictionAngle.hard.max}
                onCommit={(frictionAngle) => setSoil(s.id, { frictionAngle })}
              />
            </td>
            <td>
              <NumberField
                label={`${SOIL_FIELDS.cohesion} of ${s.label ?? s.id}`}
                value={s.cohesion}
                dimension="stress"
                units={u}
                min={LIMITS.cohesion.hard.min}
                max={LIMITS.cohesion.hard.max}
                onCommit={(cohesion) => setSoil(s.id, { cohesion })}
              />
            </td>
            <td className="soil-source">
              <textarea
                aria-label={`${SOIL_FIELDS.source} of ${s.label ?? s.id}`}
                value={s.source ?? ''}
                placeholder="not given: say where the values come from"
                maxLength={400}
                rows={2}
                onChange={(e) => setSoil(s.id, { source: e.target.value || undefined })}
              />
            </td>
            <td>
              <input
                type="radio"
                name="default-soil"
                aria-label={`Make ${s.label ?? s.id} the default soil`}
                checked={(project.defaultSoil ?? project.soils[0]!.id) === s.id}
                onChange={() => actions.setDefaultSoil(s.id)}
              />
            </td>
            <td>
              <button className="link" disabled={project.soils.length <= 1} onClick={() => actions.removeSoil(s.id)}>
                Remove
              </button>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
