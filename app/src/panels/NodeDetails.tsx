import type { Project, ProjectNode } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { NumberField } from './NumberField.js';

/** The inputs of a node: label, position, elevation, cover, soil, end condition, valve, restraint method. */
export function NodeDetails({ node, project, pipeCount }: { node: ProjectNode; project: Project; pipeCount: number }) {
  const actions = useActions();
  const u = useApp((s) => s.units);
  const set = (patch: Partial<ProjectNode>) => actions.updateNode(node.id, patch);
  return (
    <section className="inputs" aria-label={`Node ${node.id}`}>
      <h3>
        Node <span className="node-id">{node.id}</span>
      </h3>
      <div className="field">
        <label htmlFor="node-label">Label</label>
        <input
          id="node-label"
          value={node.label ?? ''}
          maxLength={80}
          onChange={(e) => set({ label: e.target.value || undefined })}
        />
      </div>
      <div className="field-row">
        <NumberField label="East" value={node.x} dimension="length" units={u} onCommit={(x) => set({ x })} />
        <NumberField label="North" value={node.y} dimension="length" units={u} onCommit={(y) => set({ y })} />
      </div>
      <div className="field-row">
        <NumberField
          label="Pipe centreline elevation"
          value={node.elevation}
          dimension="elevation"
          units={u}
          onCommit={(elevation) => set({ elevation })}
          testId="node-elevation"
        />
        <NumberField
          label="Cover to top of pipe"
          value={node.cover}
          dimension="length"
          units={u}
          min={0}
          max={30}
          onCommit={(cover) => set({ cover })}
          testId="node-cover"
        />
      </div>
      <div className="field">
        <label htmlFor="node-soil">Soil</label>
        <select id="node-soil" value={node.soil ?? ''} onChange={(e) => set({ soil: e.target.value || undefined })}>
          <option value="">
            Project default (
            {project.soils.find((s) => s.id === project.defaultSoil)?.label ??
              project.defaultSoil ??
              project.soils[0]?.label}
            )
          </option>
          {project.soils.map((s) => (
            <option key={s.id} value={s.id}>
              {s.label ?? s.id}
            </option>
          ))}
        </select>
      </div>
      {pipeCount === 1 && (
        <div className="field">
          <label htmlFor="node-end">End</label>
          <select
            id="node-end"
            value={node.end}
            onChange={(e) => set({ end: e.target.value as ProjectNode['end'] })}
            data-testid="node-end"
          >
            <option value="cap">Cap, plug or closed end (full thrust)</option>
            <option value="tie-in">Tie-in to an existing main (no restraint sized)</option>
          </select>
        </div>
      )}
      {pipeCount === 2 && (
        <label className="check">
          <input
            type="checkbox"
            checked={node.valve}
            onChange={(e) => set({ valve: e.target.checked })}
            data-testid="node-valve"
          />{' '}
          In-line valve (sized closed, full pressure on one side)
        </label>
      )}
      <div className="field">
        <label htmlFor="node-restraint">Restraint</label>
        <select
          id="node-restraint"
          value={node.restraint}
          onChange={(e) => set({ restraint: e.target.value as ProjectNode['restraint'] })}
        >
          <option value="block">Concrete: bearing block and gravity anchor</option>
          <option value="joints">Restrained joints</option>
        </select>
      </div>
    </section>
  );
}
