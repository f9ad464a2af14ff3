import {
  LIMITS,
  BEDDINGS,
  DEFAULT_BEDDING,
  WRAP_WORDS,
  beddingReference,
  findBedding,
  type Pipe,
} from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { NumberField } from './NumberField.js';
import { DESIGN_FIELDS } from '../format/fieldLabels.js';

const MIXED = 'mixed';

/** The one value every pipe shares, or MIXED. */
function shared<T>(pipes: readonly Pipe[], of: (p: Pipe) => T): T | typeof MIXED {
  const values = new Set(pipes.map(of));
  return values.size === 1 ? [...values][0]! : MIXED;
}

/**
 * How the pipes lie in the trench and what they are wrapped in — what restrained joints lean on — with
 * the safety factor on restrained length. Each laying condition is described in words; the standard's
 * number is given as its reference. A choice here applies to every pipe (one undo step); a single pipe
 * is set in its details.
 */
export function BeddingAndWrap() {
  const project = useApp((s) => s.project);
  const u = useApp((s) => s.units);
  const actions = useActions();
  const pipes = project.pipes;
  const bedding = shared(pipes, (p) => p.trenchType ?? DEFAULT_BEDDING);
  const wrap = shared(pipes, (p) => p.encasement ?? 'none');
  const shown = bedding === MIXED ? null : findBedding(bedding);
  return (
    <section className="settings-group" aria-labelledby="bedding-title" data-testid="bedding-and-wrap">
      <h4 id="bedding-title">Bedding and wrap</h4>
      <div className="field">
        <label htmlFor="bedding-all">Bedding of {pipes.length === 1 ? 'the pipe' : `all ${pipes.length} pipes`}</label>
        <select
          id="bedding-all"
          value={bedding}
          disabled={pipes.length === 0}
          onChange={(e) => actions.setBeddingEverywhere({ trenchType: Number(e.target.value) })}
        >
          {bedding === MIXED && (
            <option value={MIXED} disabled>
              {pipes.length ? 'Differs from pipe to pipe — choose one for all' : 'No pipes yet'}
            </option>
          )}
          {BEDDINGS.map((b) => (
            <option key={b.condition} value={b.condition}>
              {b.short} (condition {b.condition})
            </option>
          ))}
        </select>
        <div className="field-hint" data-testid="bedding-words">
          {shown
            ? `${shown.words} Reference: ${beddingReference(shown.condition)}.`
            : pipes.length
              ? 'Each pipe keeps its own bedding; pick one to set them all.'
              : 'Draw the main first.'}
          {shown && pipes.some((p) => p.trenchType === undefined)
            ? ` Pipes that state none are taken as condition ${DEFAULT_BEDDING} (common practice).`
            : ''}
        </div>
      </div>
      <div className="field">
        <label htmlFor="wrap-all">Wrap</label>
        <select
          id="wrap-all"
          value={wrap}
          disabled={pipes.length === 0}
          onChange={(e) => actions.setBeddingEverywhere({ encasement: e.target.value as Pipe['encasement'] })}
        >
          {wrap === MIXED && (
            <option value={MIXED} disabled>
              {pipes.length ? 'Differs from pipe to pipe — choose one for all' : 'No pipes yet'}
            </option>
          )}
          {(Object.keys(WRAP_WORDS) as NonNullable<Pipe['encasement']>[]).map((w) => (
            <option key={w} value={w}>
              {WRAP_WORDS[w]}
            </option>
          ))}
        </select>
        <div className="field-hint">A wrapped pipe grips the soil less, so its restrained lengths grow.</div>
      </div>
      <div className="field-row">
        <NumberField
          label={DESIGN_FIELDS.layingLength}
          value={project.design.layingLength}
          dimension="length"
          units={u}
          min={LIMITS.layingLength.hard.min}
          max={LIMITS.layingLength.hard.max}
          onCommit={(v) => actions.updateDesign({ layingLength: v })}
          hint="Joint to joint: restrained joints are counted and drawn from it."
        />
        <NumberField
          label={DESIGN_FIELDS.restraintSafetyFactor}
          value={project.design.restraintSafetyFactor}
          dimension="ratio"
          units={u}
          min={LIMITS.safetyFactor.hard.min}
          max={LIMITS.safetyFactor.hard.max}
          onCommit={(v) => actions.updateDesign({ restraintSafetyFactor: v })}
        />
      </div>
    </section>
  );
}
