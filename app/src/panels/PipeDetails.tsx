import {
  quantityText,
  BEDDINGS,
  DEFAULT_BEDDING,
  WRAP_WORDS,
  beddingReference,
  findBedding,
  findSeries,
  findSize,
  MATERIALS,
  nearestSize,
  seriesChoices,
  notVerifiedText,
  REGISTER,
  type Material,
  type Pipe,
  type Project,
} from '@mainbrace/solver';
import { useState } from 'react';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { planLength } from '../state/legLength.js';
import { pipeLength } from '../state/routeFigures.js';
import { MATERIAL_NAME } from '../plan/palette.js';
import { show } from '../format/quantity.js';
import { NumberField } from './NumberField.js';
import { PIPE_FIELDS } from '../format/fieldLabels.js';
import { useNodeName } from './nodeNames.js';

const CUSTOM = '__custom';

/** The inputs of a pipe: material, catalogue size or custom diameters, flow, label, laying details. */
export function PipeDetails({ pipe, project }: { pipe: Pipe; project: Project }) {
  const actions = useActions();
  const u = useApp((s) => s.units);
  const set = (patch: Partial<Pipe>) => actions.updatePipe(pipe.id, patch);
  const series = pipe.series ? findSeries(pipe.series) : undefined;
  const choices = seriesChoices(pipe.material, project.units);
  const length = pipeLength(useAnalysis(), pipe);
  const bedding = findBedding(pipe.trenchType);
  const rating = pipe.series && pipe.nominal ? findSize(pipe.series, pipe.nominal)?.rating : undefined;
  const plan = planLength(project, pipe.id);
  const [moving, setMoving] = useState<'from' | 'to'>('to');
  const nodeName = useNodeName();
  const [fromName, toName] = [nodeName(pipe.from), nodeName(pipe.to)];
  const movedName = moving === 'to' ? toName : fromName;
  const fixedName = moving === 'to' ? fromName : toName;

  const pickSeries = (id: string) => {
    if (id === CUSTOM) return set({ series: undefined, nominal: undefined });
    const size = nearestSize(id, pipe.outsideDiameter)!;
    set({
      series: id,
      nominal: size.nominal,
      outsideDiameter: size.outsideDiameter,
      insideDiameter: size.insideDiameter,
    });
  };
  const pickSize = (nominal: string) => {
    const size = pipe.series ? findSize(pipe.series, nominal) : undefined;
    if (size) set({ nominal, outsideDiameter: size.outsideDiameter, insideDiameter: size.insideDiameter });
  };
  const pickMaterial = (m: Material) => {
    const first = seriesChoices(m, project.units)[0];
    if (!first) return set({ material: m, series: undefined, nominal: undefined });
    const size = nearestSize(first.id, pipe.outsideDiameter)!;
    set({
      material: m,
      series: first.id,
      nominal: size.nominal,
      outsideDiameter: size.outsideDiameter,
      insideDiameter: size.insideDiameter,
    });
  };

  return (
    <section className="inputs" aria-label={`Pipe ${pipe.id}`}>
      <h3>
        Pipe from {fromName} to {toName}{' '}
        <span className="muted">
          {show(length, 'length', u, 4)}, id {pipe.id}
        </span>
      </h3>
      <div className="field">
        <label htmlFor="pipe-label">{PIPE_FIELDS.label}</label>
        <input
          id="pipe-label"
          value={pipe.label ?? ''}
          maxLength={80}
          onChange={(e) => set({ label: e.target.value || undefined })}
        />
      </div>
      <NumberField
        label="Plan length"
        value={plan}
        dimension="length"
        units={u}
        min={0}
        exclusiveMin
        max={1e6}
        onCommit={(length) => actions.setPipeLength(pipe.id, length, moving)}
        testId="pipe-plan-length"
        hint={`Typing a length moves ${movedName} along the pipe; ${fixedName} stays.`}
      />
      <button
        type="button"
        className="link small leg-swap"
        onClick={() => setMoving(moving === 'to' ? 'from' : 'to')}
        data-testid="pipe-length-swap"
      >
        Move {fixedName} instead
      </button>
      <div className="field">
        <label htmlFor="pipe-material">Material</label>
        <select id="pipe-material" value={pipe.material} onChange={(e) => pickMaterial(e.target.value as Material)}>
          {MATERIALS.map((m) => (
            <option key={m} value={m}>
              {MATERIAL_NAME[m]}
            </option>
          ))}
        </select>
      </div>
      <div className="field">
        <label htmlFor="pipe-series">Series</label>
        <select
          id="pipe-series"
          value={series ? series.id : CUSTOM}
          onChange={(e) => pickSeries(e.target.value)}
          data-testid="pipe-series"
        >
          {choices.map((s) => (
            <option key={s.id} value={s.id}>
              {s.label}
            </option>
          ))}
          <option value={CUSTOM}>Custom diameters</option>
        </select>
        {series && (
          <div className="field-hint">
            {series.standard}; {series.wallBasis}
          </div>
        )}
      </div>
      {series ? (
        <div className="field">
          <label htmlFor="pipe-size">Nominal size</label>
          <select
            id="pipe-size"
            value={pipe.nominal ?? ''}
            onChange={(e) => pickSize(e.target.value)}
            data-testid="pipe-size"
          >
            {series.sizes.map((s) => (
              <option key={s.nominal} value={s.nominal}>
                {s.label} — OD {quantityText(s.outsideDiameter, 'diameter', u)}
              </option>
            ))}
          </select>
          <div className="field-hint">
            OD {show(pipe.outsideDiameter, 'diameter', u, 4)}, ID {show(pipe.insideDiameter, 'diameter', u, 4)}
          </div>
          {rating && (
            <div className="field-hint" data-testid="pipe-rating">
              Rated {rating.label}: working {show(rating.working, 'pressure', u, 4)}, with surge{' '}
              {show(rating.withSurge, 'pressure', u, 4)}, field test {show(rating.test, 'pressure', u, 4)}
              {REGISTER[rating.basis].verified ? '' : ` (${notVerifiedText(REGISTER[rating.basis])})`}. Each case is
              checked against its limit.
            </div>
          )}
        </div>
      ) : (
        <div className="field-row">
          <NumberField
            label={PIPE_FIELDS.outsideDiameter}
            value={pipe.outsideDiameter}
            dimension="diameter"
            units={u}
            min={pipe.insideDiameter}
            exclusiveMin
            max={5}
            onCommit={(outsideDiameter) => set({ outsideDiameter })}
          />
          <NumberField
            label={PIPE_FIELDS.insideDiameter}
            value={pipe.insideDiameter}
            dimension="diameter"
            units={u}
            min={0}
            exclusiveMin
            max={pipe.outsideDiameter * 0.999999}
            onCommit={(insideDiameter) => set({ insideDiameter })}
          />
        </div>
      )}
      <NumberField
        label={`${PIPE_FIELDS.flow}, ${fromName} → ${toName}`}
        value={pipe.flow}
        dimension="flow"
        units={u}
        min={-100}
        max={100}
        onCommit={(flow) => set({ flow })}
        hint="Negative when the water runs the other way; cases multiply it by their flow factor."
      />
      <h4>Bedding and wrap</h4>
      <div className="field">
        <label htmlFor="pipe-trench">Bedding</label>
        <select
          id="pipe-trench"
          value={pipe.trenchType ?? ''}
          onChange={(e) => set({ trenchType: e.target.value ? Number(e.target.value) : undefined })}
        >
          <option value="">Not stated (taken as condition {DEFAULT_BEDDING})</option>
          {BEDDINGS.map((b) => (
            <option key={b.condition} value={b.condition}>
              {b.short} (condition {b.condition})
            </option>
          ))}
        </select>
        <div className="field-hint">
          {bedding.words} Reference: {beddingReference(bedding.condition)}.
        </div>
      </div>
      <div className="field">
        <label htmlFor="pipe-encasement">Wrap</label>
        <select
          id="pipe-encasement"
          value={pipe.encasement ?? 'none'}
          onChange={(e) => set({ encasement: e.target.value as Pipe['encasement'] })}
        >
          {(Object.keys(WRAP_WORDS) as NonNullable<Pipe['encasement']>[]).map((w) => (
            <option key={w} value={w}>
              {WRAP_WORDS[w]}
            </option>
          ))}
        </select>
      </div>
    </section>
  );
}
