import { LIMITS, nodeCover, type Project, type ProjectNode } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { NumberField } from './NumberField.js';
import { largestOd, levelPatch, type LevelEdit } from './nodeLevels.js';
import { NODE_FIELDS } from '../format/fieldLabels.js';
import { nodeTitle, useNodeName } from './nodeNames.js';

/** The inputs of a node: label, position, elevation, cover, soil, end condition, valve, restraint method. */
export function NodeDetails({ node, project, pipeCount }: { node: ProjectNode; project: Project; pipeCount: number }) {
  const actions = useActions();
  const u = useApp((s) => s.units);
  const nodeName = useNodeName();
  const set = (patch: Partial<ProjectNode>) => actions.updateNode(node.id, patch);
  const od = largestOd(project, node.id);
  const level = (e: LevelEdit) => set(levelPatch(node, od, e));
  const grounded = node.groundLevel !== undefined;
  return (
    <section className="inputs" aria-label={`Node ${node.id}`}>
      <h3>
        {nodeTitle(nodeName(node.id))} <span className="muted">id {node.id}</span>
      </h3>
      <div className="field">
        <label htmlFor="node-label">{NODE_FIELDS.label}</label>
        <input
          id="node-label"
          value={node.label ?? ''}
          maxLength={80}
          onChange={(e) => set({ label: e.target.value || undefined })}
        />
      </div>
      <div className="field-row">
        <NumberField
          label={NODE_FIELDS.x}
          value={node.x}
          dimension="length"
          units={u}
          min={LIMITS.coordinate.hard.min}
          max={LIMITS.coordinate.hard.max}
          onCommit={(x) => set({ x })}
          testId="node-east"
        />
        <NumberField
          label={NODE_FIELDS.y}
          value={node.y}
          dimension="length"
          units={u}
          min={LIMITS.coordinate.hard.min}
          max={LIMITS.coordinate.hard.max}
          onCommit={(y) => set({ y })}
          testId="node-north"
        />
      </div>
      {grounded && (
        <div className="field-row">
          <NumberField
            label={NODE_FIELDS.groundLevel}
            value={node.groundLevel!}
            dimension="elevation"
            units={u}
            min={LIMITS.elevation.hard.min}
            max={LIMITS.elevation.hard.max}
            onCommit={(value) => level({ typed: 'ground', value })}
            hint="Surveyed; the pipe keeps its cover"
            testId="node-ground"
          />
          <button type="button" className="link-button" onClick={() => level({ typed: 'remove-ground' })}>
            No ground level
          </button>
        </div>
      )}
      <div className="field-row">
        <NumberField
          label={NODE_FIELDS.elevation}
          value={node.elevation}
          dimension="elevation"
          units={u}
          min={LIMITS.elevation.hard.min}
          max={grounded ? node.groundLevel! - od / 2 : LIMITS.elevation.hard.max}
          onCommit={(value) => level({ typed: 'pipe', value })}
          {...(grounded ? { hint: 'Type it and the cover follows' } : {})}
          testId="node-elevation"
        />
        <NumberField
          label={NODE_FIELDS.cover}
          value={nodeCover(node, od)}
          dimension="length"
          units={u}
          min={0}
          max={30}
          onCommit={(value) => level({ typed: 'cover', value })}
          {...(grounded ? { hint: 'Type it and the pipe level follows' } : {})}
          testId="node-cover"
        />
      </div>
      {!grounded && (
        <button
          type="button"
          className="link-button"
          onClick={() => level({ typed: 'add-ground' })}
          data-testid="node-add-ground"
        >
          Give a ground level
        </button>
      )}
      <div className="field">
        <label htmlFor="node-soil">{NODE_FIELDS.soil}</label>
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
