import { LIMITS } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { NumberField } from './NumberField.js';
import { DESIGN_FIELDS } from '../format/fieldLabels.js';

/** Blocks and anchors (their safety factors and concrete), then the water and the ground around the main. */
export function DesignSettings() {
  const project = useApp((s) => s.project);
  const u = useApp((s) => s.units);
  const actions = useActions();
  const d = project.design;
  return (
    <>
      <section className="settings-group" aria-labelledby="blocks-title">
        <h4 id="blocks-title">Blocks and anchors</h4>
        <div className="field-row">
          <NumberField
            label={DESIGN_FIELDS.bearingSafetyFactor}
            value={d.bearingSafetyFactor}
            dimension="ratio"
            units={u}
            min={LIMITS.safetyFactor.hard.min}
            max={LIMITS.safetyFactor.hard.max}
            onCommit={(v) => actions.updateDesign({ bearingSafetyFactor: v })}
          />
          <NumberField
            label={DESIGN_FIELDS.upliftSafetyFactor}
            value={d.upliftSafetyFactor}
            dimension="ratio"
            units={u}
            min={LIMITS.safetyFactor.hard.min}
            max={LIMITS.safetyFactor.hard.max}
            onCommit={(v) => actions.updateDesign({ upliftSafetyFactor: v })}
          />
        </div>
        <div className="field-row">
          <NumberField
            label={DESIGN_FIELDS.concreteUnitWeight}
            value={d.concreteUnitWeight}
            dimension="unitWeight"
            units={u}
            min={LIMITS.concreteUnitWeight.hard.min}
            max={LIMITS.concreteUnitWeight.hard.max}
            onCommit={(v) => actions.updateDesign({ concreteUnitWeight: v })}
          />
          <NumberField
            label={DESIGN_FIELDS.blockDepth}
            value={d.blockDepth}
            dimension="length"
            units={u}
            min={LIMITS.blockDepth.hard.min}
            max={LIMITS.blockDepth.hard.max}
            onCommit={(v) => actions.updateDesign({ blockDepth: v })}
          />
        </div>
      </section>
      <section className="settings-group" aria-labelledby="water-title">
        <h4 id="water-title">Water and ground</h4>
        <div className="field-row">
          <NumberField
            label="Water density"
            value={project.water.density}
            dimension="density"
            units={u}
            min={LIMITS.density.hard.min}
            max={LIMITS.density.hard.max}
            onCommit={actions.setWaterDensity}
          />
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
              label={DESIGN_FIELDS.groundwaterElevation}
              value={d.groundwaterElevation}
              dimension="elevation"
              units={u}
              min={LIMITS.elevation.hard.min}
              max={LIMITS.elevation.hard.max}
              onCommit={(v) => actions.updateDesign({ groundwaterElevation: v })}
            />
            <button className="link" onClick={() => actions.updateDesign({ groundwaterElevation: null })}>
              Below every block
            </button>
          </div>
        )}
      </section>
    </>
  );
}
