import { useState } from 'react';
import { SOIL_LIBRARY, type Soil, LIMITS } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { nextId } from '../state/documentEdits.js';
import { NumberField } from './NumberField.js';
import { show } from '../format/quantity.js';

/** The project's soils with their sources, the built-in library to copy from, and the design settings. */
export function SoilsPanel() {
  const project = useApp((s) => s.project);
  const actions = useActions();
  const [pick, setPick] = useState(SOIL_LIBRARY[0]!.id);
  const u = useApp((s) => s.units);
  const d = project.design;
  const setSoil = (id: string, patch: Partial<Soil>) => actions.updateSoil(id, patch);
  const copyFromLibrary = () => {
    const lib = SOIL_LIBRARY.find((s) => s.id === pick)!;
    const { family: _family, ...soil } = lib;
    const id = project.soils.some((s) => s.id === lib.id)
      ? nextId(
          `${lib.id}-`,
          project.soils.map((s) => s.id),
        )
      : lib.id;
    actions.addSoil({ ...soil, id });
  };
  return (
    <div className="soils-panel">
      <div>
        <table className="edit-table" data-testid="soils-table">
          <thead>
            <tr>
              <th>Soil</th>
              <th>Horizontal bearing</th>
              <th>Unit weight</th>
              <th>Friction angle</th>
              <th>Cohesion</th>
              <th>Default</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {project.soils.map((s) => (
              <tr key={s.id}>
                <td>
                  <input
                    aria-label={`Name of soil ${s.id}`}
                    value={s.label ?? ''}
                    placeholder={s.id}
                    maxLength={80}
                    onChange={(e) => setSoil(s.id, { label: e.target.value || undefined })}
                  />
                  {s.source && <div className="field-hint">{s.source}</div>}
                </td>
                <td>
                  <NumberField
                    label={`Bearing of ${s.label ?? s.id}`}
                    value={s.bearing}
                    dimension="stress"
                    units={u}
                    min={0}
                    max={5e6}
                    onCommit={(bearing) => setSoil(s.id, { bearing })}
                    hint={s.bearingPerDepth ? `+ ${show(s.bearingPerDepth, 'stressGradient', u)} of depth` : undefined}
                  />
                </td>
                <td>
                  <NumberField
                    label={`Unit weight of ${s.label ?? s.id}`}
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
                    label={`Friction angle of ${s.label ?? s.id}`}
                    value={s.frictionAngle}
                    dimension="angle"
                    units={u}
                    min={0}
                    max={59}
                    onCommit={(frictionAngle) => setSoil(s.id, { frictionAngle })}
                  />
                </td>
                <td>
                  <NumberField
                    label={`Cohesion of ${s.label ?? s.id}`}
                    value={s.cohesion}
                    dimension="stress"
                    units={u}
                    min={0}
                    max={1e6}
                    onCommit={(cohesion) => setSoil(s.id, { cohesion })}
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
                  <button
                    className="link"
                    disabled={project.soils.length <= 1}
                    onClick={() => actions.removeSoil(s.id)}
                  >
                    Remove
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <div className="library-pick">
          <label>
            Copy from the library{' '}
            <select value={pick} onChange={(e) => setPick(e.target.value)} data-testid="soil-library">
              {SOIL_LIBRARY.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.label} (
                  {s.family === 'ibc-1806'
                    ? 'IBC 1806.2'
                    : s.family === 'safe-bearing'
                      ? 'PVC safe bearing'
                      : 'horizontal bearing table'}
                  )
                </option>
              ))}
            </select>
          </label>{' '}
          <button onClick={copyFromLibrary}>Add soil</button>
          <p className="field-hint">{SOIL_LIBRARY.find((s) => s.id === pick)?.source}</p>
        </div>
      </div>
      <div className="design-settings" aria-label="Design settings">
        <h4>Design settings</h4>
        <div className="field-row">
          <NumberField
            label="Bearing safety factor"
            value={d.bearingSafetyFactor}
            dimension="ratio"
            units={u}
            min={1}
            max={10}
            onCommit={(v) => actions.updateDesign({ bearingSafetyFactor: v })}
          />
          <NumberField
            label="Uplift safety factor"
            value={d.upliftSafetyFactor}
            dimension="ratio"
            units={u}
            min={1}
            max={10}
            onCommit={(v) => actions.updateDesign({ upliftSafetyFactor: v })}
          />
          <NumberField
            label="Restrained-joint safety factor"
            value={d.restraintSafetyFactor}
            dimension="ratio"
            units={u}
            min={1}
            max={10}
            onCommit={(v) => actions.updateDesign({ restraintSafetyFactor: v })}
          />
        </div>
        <div className="field-row">
          <NumberField
            label="Concrete unit weight"
            value={d.concreteUnitWeight}
            dimension="unitWeight"
            units={u}
            min={LIMITS.concreteUnitWeight.hard.min}
            max={LIMITS.concreteUnitWeight.hard.max}
            onCommit={(v) => actions.updateDesign({ concreteUnitWeight: v })}
          />
          <NumberField
            label="Block depth to bearing face"
            value={d.blockDepth}
            dimension="length"
            units={u}
            min={0.1}
            max={5}
            onCommit={(v) => actions.updateDesign({ blockDepth: v })}
          />
          <NumberField
            label="Water density"
            value={project.water.density}
            dimension="density"
            units={u}
            min={900}
            max={1100}
            onCommit={actions.setWaterDensity}
          />
        </div>
        <div className="field-row">
          <div className="field">
            <label htmlFor="thrust-area">Pressure acts on</label>
            <select
              id="thrust-area"
              value={d.thrustArea}
              onChange={(e) => actions.updateDesign({ thrustArea: e.target.value as 'outside' | 'inside' })}
            >
              <option value="outside">Outside diameter (push-on and mechanical joints)</option>
              <option value="inside">Inside diameter (welded or flanged)</option>
            </select>
          </div>
          {d.groundwaterElevation === null ? (
            <div className="field">
              <label>Groundwater</label>
              <button
                onClick={() =>
                  actions.updateDesign({
                    groundwaterElevation: Math.min(...project.nodes.map((n) => n.elevation), 100),
                  })
                }
              >
                Below every block — set a level
              </button>
            </div>
          ) : (
            <div className="field">
              <NumberField
                label="Highest groundwater elevation"
                value={d.groundwaterElevation}
                dimension="elevation"
                units={u}
                onCommit={(v) => actions.updateDesign({ groundwaterElevation: v })}
              />
              <button className="link" onClick={() => actions.updateDesign({ groundwaterElevation: null })}>
                Below every block
              </button>
            </div>
          )}
        </div>
      </div>
    </div>
  );
}
