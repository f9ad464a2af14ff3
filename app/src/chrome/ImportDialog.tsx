import { useEffect, useRef, useState } from 'react';
import type { ColumnMapping, SurveyUnit } from '@mainbrace/solver/exchange';
import { useApp } from '../state/StoreContext.js';
import { NumberField } from '../panels/NumberField.js';
import type { ImportChoices, PendingImport } from '../files/routeImport.js';

const NONE = '';

/**
 * Asked once per route file: which CSV columns hold what and in which unit, whether levels are ground
 * or pipe, the cover, and how close points must be to join. Nothing changes until "Import".
 */
export function ImportDialog({
  pending,
  onImport,
  onCancel,
}: {
  pending: PendingImport;
  onImport: (c: ImportChoices) => void;
  onCancel: () => void;
}) {
  const units = useApp((s) => s.units);
  const csv = pending.kind === 'csv';
  const [mapping, setMapping] = useState<Partial<ColumnMapping>>(pending.guess);
  const [unit, setUnit] = useState<SurveyUnit>(units === 'us' ? 'ft' : 'm');
  const [levels, setLevels] = useState<'ground' | 'pipe'>('ground');
  const [cover, setCover] = useState(1.2);
  const [tolerance, setTolerance] = useState(0.1);
  const firstColumn = useRef<HTMLSelectElement>(null);
  const go = useRef<HTMLButtonElement>(null);
  useEffect(() => (firstColumn.current ?? go.current)?.focus(), []);
  const hasLevels = csv ? mapping.level !== undefined : pending.hasLevels;
  const ready = !csv || (mapping.easting !== undefined && mapping.northing !== undefined);
  const column = (role: keyof ColumnMapping, label: string, optional: boolean) => (
    <label className="field">
      {label}
      <select
        ref={role === 'easting' ? firstColumn : undefined}
        value={mapping[role] ?? NONE}
        data-testid={`import-column-${role}`}
        onChange={(e) => {
          const { [role]: _drop, ...rest } = mapping;
          setMapping(e.target.value === NONE ? rest : { ...rest, [role]: e.target.value });
        }}
      >
        <option value={NONE}>{optional ? '— none —' : '— choose a column —'}</option>
        {pending.header.map((h) => (
          <option key={h} value={h}>
            {h}
          </option>
        ))}
      </select>
    </label>
  );
  return (
    <div className="dialog-backdrop" onClick={onCancel}>
      <div
        className="dialog import-dialog"
        role="dialog"
        aria-modal="true"
        aria-labelledby="import-title"
        onClick={(e) => e.stopPropagation()}
        onKeyDown={(e) => e.key === 'Escape' && onCancel()}
      >
        <h2 id="import-title">
          Import {csv ? 'survey points' : 'a GeoJSON route'} from {pending.name}
        </h2>
        <p className="import-lead">
          {csv
            ? 'Say which columns hold the easting, northing and level. Points are joined in row order; a run column splits them into runs.'
            : 'Longitude and latitude (WGS 84) are projected to a local plane in metres about the route; each LineString becomes a run.'}{' '}
          The route replaces the one on the plan; cases, soils and design settings stay (undo brings the old route
          back).
        </p>
        {csv && (
          <div className="import-grid">
            {column('easting', 'Easting', false)}
            {column('northing', 'Northing', false)}
            {column('level', 'Level', true)}
            {column('run', 'Run', true)}
            <label className="field">
              Coordinates and levels in
              <select value={unit} onChange={(e) => setUnit(e.target.value as SurveyUnit)} data-testid="import-unit">
                <option value="m">metres</option>
                <option value="ft">feet (international, 0.3048 m)</option>
                <option value="us-ft">US survey feet (1200/3937 m)</option>
              </select>
            </label>
          </div>
        )}
        {hasLevels && (
          <fieldset className="import-levels">
            <legend>The levels are</legend>
            <label className="check">
              <input type="radio" checked={levels === 'ground'} onChange={() => setLevels('ground')} /> ground surface:
              the pipe goes at the cover below
            </label>
            <label className="check">
              <input
                type="radio"
                checked={levels === 'pipe'}
                onChange={() => setLevels('pipe')}
                data-testid="import-levels-pipe"
              />{' '}
              pipe centreline
            </label>
          </fieldset>
        )}
        <div className="field-row">
          <NumberField
            label="Cover to top of pipe"
            value={cover}
            dimension="length"
            units={units}
            min={0}
            max={30}
            onCommit={setCover}
            testId="import-cover"
          />
          <NumberField
            label="Join points closer than"
            value={tolerance}
            dimension="length"
            units={units}
            min={0.001}
            max={100}
            onCommit={setTolerance}
            testId="import-tolerance"
          />
        </div>
        <div className="dialog-actions">
          <button onClick={onCancel}>Cancel</button>
          <button
            className="primary"
            disabled={!ready}
            ref={go}
            data-testid="import-go"
            onClick={() =>
              onImport({
                mapping: csv ? (mapping as ColumnMapping) : null,
                unit,
                levels: hasLevels ? levels : 'pipe',
                cover,
                tolerance,
              })
            }
          >
            Import
          </button>
        </div>
      </div>
    </div>
  );
}
