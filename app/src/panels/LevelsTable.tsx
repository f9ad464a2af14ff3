import { useMemo, useState } from 'react';
import { columnNumber, LIMITS, nodeCover, nodeGround, type Analysis, type Project } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { unitOf } from '../format/quantity.js';
import { NODE_FIELDS } from '../format/fieldLabels.js';
import { NumberField } from './NumberField.js';
import { evenGrade, levelPatch, type LevelEdit } from './nodeLevels.js';
import { useNodeName } from './nodeNames.js';

/** Rows shown before "Show all": a long route's table stays quick to open. */
const FIRST_ROWS = 150;

interface LevelRow {
  run: string;
  id: string;
  /** m along the run, as the schedule states it */
  chainage: number;
  /** m in plan from the run's start: an even grade is even in plan */
  plan: number;
}

/** Every run's nodes in the order a crew walks them; a branch starts at the fitting it leaves from. */
function levelRows(project: Project, analysis: Analysis): LevelRow[][] {
  const at = new Map(project.nodes.map((n) => [n.id, n]));
  return analysis.runs.map((run) => {
    const list = run.nodes[0]?.id === run.start ? run.nodes : [{ id: run.start, chainage: 0 }, ...run.nodes];
    let plan = 0;
    return list.map((n, i) => {
      const [a, b] = [at.get(list[i - 1]?.id ?? n.id)!, at.get(n.id)!];
      plan += Math.hypot(b.x - a.x, b.y - a.y);
      return { run: run.letter, id: n.id, chainage: n.chainage, plan };
    });
  });
}

/**
 * The levels of every node in a table, typed in place (nodeLevels.ts: a ground level keeps the cover and
 * moves the pipe, a pipe level or a cover keeps the ground), and a stretch of a run laid on an even grade
 * in one step.
 */
export function LevelsTable({ project, analysis }: { project: Project; analysis: Analysis }) {
  const actions = useActions();
  const u = useApp((s) => s.units);
  const nodeName = useNodeName();
  const runs = useMemo(() => levelRows(project, analysis), [project, analysis]);
  const [showAll, setShowAll] = useState(false);
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const [said, setSaid] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const nodes = useMemo(() => new Map(project.nodes.map((n) => [n.id, n])), [project]);
  // Each node's largest pipe, from the analysis's legs: one pass, not a search of every pipe per row.
  const odAt = (id: string) => Math.max(0, ...(analysis.legs.get(id) ?? []).map((l) => l.pipe.outsideDiameter));
  const total = runs.reduce((s, r) => s + r.length, 0);
  const unit = (d: 'elevation' | 'length') => unitOf(d, u);
  const key = (r: number, i: number) => `${r}:${i}`;

  const lay = () => {
    if (!from || !to) return setSaid({ tone: 'bad', text: 'Choose the first and the last node of the stretch.' });
    const [a, b] = [from, to].map((k) => k.split(':').map(Number)) as [[number, number], [number, number]];
    if (a[0] !== b[0])
      return setSaid({
        tone: 'bad',
        text: `Both ends must be on one run: ${nodeName(runs[a[0]]![a[1]]!.id)} is on run ${runs[a[0]]![0]!.run}, ${nodeName(runs[b[0]]![b[1]]!.id)} on run ${runs[b[0]]![0]!.run}.`,
      });
    const [lo, hi] = a[1] < b[1] ? [a[1], b[1]] : [b[1], a[1]];
    const stretch = runs[a[0]]!.slice(lo, hi + 1);
    if (stretch.length < 3) return setSaid({ tone: 'bad', text: 'No node lies between those two: nothing to lay.' });
    const [first, last] = [stretch[0]!, stretch.at(-1)!];
    const patches = evenGrade(
      project,
      stretch.map((r) => ({ id: r.id, chainage: r.plan })),
    );
    const refused = actions.updateNodes(patches);
    if (refused.length > 0) return setSaid({ tone: 'bad', text: refused.join(' ') });
    const grade = (nodes.get(last.id)!.elevation - nodes.get(first.id)!.elevation) / (last.plan - first.plan || 1);
    setSaid({
      tone: 'ok',
      text:
        patches.size === 0
          ? `The pipe from ${nodeName(first.id)} to ${nodeName(last.id)} already lies on an even grade.`
          : `${patches.size} node${patches.size === 1 ? '' : 's'} from ${nodeName(first.id)} to ${nodeName(last.id)} laid on an even grade of ${(grade * 100).toFixed(2)} % (Undo takes it back).`,
    });
  };

  // Both ends of a stretch are chosen from the same list: every run's nodes, by run.
  const choices = [
    <option key="none" value="">
      choose a node
    </option>,
    ...runs.map((rows, r) => (
      <optgroup key={r} label={`Run ${rows[0]?.run ?? ''}`}>
        {rows.map((row, i) => (
          <option key={i} value={key(r, i)}>
            {nodeName(row.id)}
          </option>
        ))}
      </optgroup>
    )),
  ];
  let shown = 0;
  return (
    <section className="levels" aria-label="Levels node by node" data-testid="levels-table">
      <h4>Levels, node by node</h4>
      <p className="muted">
        Type a ground level and the pipe keeps its cover; type the pipe level or the cover and the ground stays. Ground
        levels in grey are not surveyed: they follow from the cover.
      </p>
      <div className="levels-grade">
        <label>
          Lay the pipe on an even grade from{' '}
          <select value={from} onChange={(e) => setFrom(e.target.value)} data-testid="grade-from">
            {choices}
          </select>
        </label>{' '}
        <label>
          to{' '}
          <select value={to} onChange={(e) => setTo(e.target.value)} data-testid="grade-to">
            {choices}
          </select>
        </label>{' '}
        <button type="button" onClick={lay} data-testid="grade-lay">
          Lay evenly
        </button>
        {said && (
          <span className={said.tone === 'bad' ? 'field-error' : 'muted'} role="status" data-testid="grade-said">
            {said.text}
          </span>
        )}
      </div>
      <table className="levels-table">
        <thead>
          <tr>
            <th>Run</th>
            <th>Node</th>
            <th>Chainage ({unit('length')})</th>
            <th>Ground level ({unit('elevation')})</th>
            <th>Cover ({unit('length')})</th>
            <th>Pipe centreline ({unit('elevation')})</th>
            <th>Grade to the next node (%)</th>
          </tr>
        </thead>
        <tbody>
          {runs.flatMap((rows) =>
            rows.map((row, i) => {
              if (!showAll && shown >= FIRST_ROWS) return null;
              shown++;
              const node = nodes.get(row.id)!;
              const od = odAt(row.id);
              const level = (e: LevelEdit) => actions.updateNode(row.id, levelPatch(node, od, e));
              const next = rows[i + 1];
              const grade = next
                ? ((nodes.get(next.id)!.elevation - node.elevation) / (next.plan - row.plan || 1)) * 100
                : null;
              const name = nodeName(row.id);
              return (
                <tr key={`${row.run}-${row.id}`}>
                  <td>{i === 0 ? row.run : ''}</td>
                  <td>{name}</td>
                  <td className="num">{columnNumber(row.chainage, 'chainage', u)}</td>
                  <td className={node.groundLevel === undefined ? 'implied' : undefined}>
                    <NumberField
                      compact
                      label={`${NODE_FIELDS.groundLevel}, ${name}`}
                      value={nodeGround(node, od)}
                      dimension="elevation"
                      units={u}
                      min={LIMITS.elevation.hard.min}
                      max={LIMITS.elevation.hard.max}
                      onCommit={(value) => level({ typed: 'ground', value })}
                    />
                  </td>
                  <td>
                    <NumberField
                      compact
                      label={`${NODE_FIELDS.cover}, ${name}`}
                      value={nodeCover(node, od)}
                      dimension="length"
                      units={u}
                      min={0}
                      max={LIMITS.cover.hard.max}
                      onCommit={(value) => level({ typed: 'cover', value })}
                    />
                  </td>
                  <td>
                    <NumberField
                      compact
                      label={`${NODE_FIELDS.elevation}, ${name}`}
                      value={node.elevation}
                      dimension="elevation"
                      units={u}
                      min={LIMITS.elevation.hard.min}
                      max={node.groundLevel !== undefined ? node.groundLevel - od / 2 : LIMITS.elevation.hard.max}
                      onCommit={(value) => level({ typed: 'pipe', value })}
                    />
                  </td>
                  <td className="num">{grade === null ? '' : grade.toFixed(2)}</td>
                </tr>
              );
            }),
          )}
        </tbody>
      </table>
      {!showAll && total > FIRST_ROWS && (
        <button type="button" className="link-button" onClick={() => setShowAll(true)}>
          Show all {total} rows
        </button>
      )}
    </section>
  );
}
