import { describe, expect, it } from 'vitest';
import type { Project } from '@mainbrace/solver';
import { selectStep, type SelectEffect, type SelectEvent, type SelectState } from './selectTool.js';
import { hitTest, inBox } from '../plan/hitTest.js';
import { moveNodes, type PlanPoint } from '../state/documentEdits.js';
import { at, chain, expectValid } from '../testFixtures.js';

/** m: a 4 px drag threshold and a 9 px hit radius at 20 px/m */
const THRESHOLD = 0.2;
const TOLERANCE = 0.45;

/** A dog-leg main: Harrow Bank 1 (0, 0) → 2 (30, 0) → 3 (30, 40). */
const dogLeg = () => chain([0, 0], [30, 0], [30, 40]);

type Pointer = { down: PlanPoint; shift?: boolean } | { move: PlanPoint } | { up: PlanPoint };

/**
 * Feeds plan-space pointer events to the select tool, hit-testing downs against the document, and
 * applies a drop to the document as the plan does. Previews never touch the document.
 */
function gesture(doc: Project, selected: string[], pointers: Pointer[]) {
  let state: SelectState = { phase: 'idle' };
  const effects: SelectEffect[] = [];
  const ctx = {
    dragThreshold: THRESHOLD,
    selectedNodes: new Set(selected),
    nodeAt: (id: string) => doc.nodes.find((n) => n.id === id) && at(doc, id),
  };
  for (const p of pointers) {
    const event: SelectEvent =
      'down' in p
        ? { type: 'down', at: p.down, hit: hitTest(doc, p.down, TOLERANCE), additive: p.shift ?? false }
        : 'move' in p
          ? { type: 'move', at: p.move }
          : { type: 'up', at: p.up };
    const out = selectStep(state, event, ctx);
    state = out.state;
    if (out.effect) effects.push(out.effect);
    if (out.effect?.kind === 'move') doc = moveNodes(doc, out.effect.positions);
  }
  return { doc, state, effects, kinds: effects.map((e) => e.kind) };
}

describe('select tool: clicks', () => {
  it('selects what was clicked: a press and release on node n2 asks to select n2 alone', () => {
    const { effects } = gesture(dogLeg(), [], [{ down: { x: 30.1, y: 0.1 } }, { up: { x: 30.1, y: 0.1 } }]);
    expect(effects).toEqual([
      { kind: 'select', hit: { kind: 'node', id: 'n2', at: { x: 30, y: 0 } }, additive: false },
    ]);
  });

  it('makes a Shift-click additive, on a pipe as on a node', () => {
    const { effects } = gesture(
      dogLeg(),
      ['n1'],
      [{ down: { x: 30.2, y: 20 }, shift: true }, { up: { x: 30.2, y: 20 } }],
    );
    expect(effects).toEqual([
      { kind: 'select', hit: { kind: 'pipe', id: 'p2', at: { x: 30, y: 20 } }, additive: true },
    ]);
  });

  it('does not move a node on press and release without moving, nor on a wobble below the threshold', () => {
    const before = dogLeg();
    const { doc, kinds } = gesture(
      before,
      ['n2'],
      [{ down: { x: 30, y: 0 } }, { move: { x: 30.1, y: 0.1 } }, { up: { x: 30.1, y: 0.1 } }],
    );
    expect(kinds).toEqual(['select']);
    expect(doc).toBe(before);
  });
});

describe('select tool: dragging nodes', () => {
  it('previews past the threshold without touching the document, then moves every selected node by the same offset on drop', () => {
    const before = dogLeg();
    const run = gesture(
      before,
      ['n2', 'n3'],
      [{ down: { x: 30, y: 0 } }, { move: { x: 33, y: 1 } }, { move: { x: 35, y: 2 } }],
    );
    expect(run.doc).toBe(before);
    expect(run.kinds).toEqual(['preview', 'preview']);
    const last = run.effects[1] as Extract<SelectEffect, { kind: 'preview' }>;
    expect(Object.fromEntries(last.positions)).toEqual({ n2: { x: 35, y: 2 }, n3: { x: 35, y: 42 } });

    const { doc } = gesture(
      before,
      ['n2', 'n3'],
      [{ down: { x: 30, y: 0 } }, { move: { x: 33, y: 1 } }, { move: { x: 35, y: 2 } }, { up: { x: 35, y: 2 } }],
    );
    expect([at(doc, 'n1'), at(doc, 'n2'), at(doc, 'n3')]).toEqual([
      { x: 0, y: 0 },
      { x: 35, y: 2 },
      { x: 35, y: 42 },
    ]);
    expectValid(doc);
  });

  it('drags only the pressed node when it is not in the selection', () => {
    const { doc } = gesture(
      dogLeg(),
      ['n3'],
      [{ down: { x: 0, y: 0 } }, { move: { x: -4, y: 3 } }, { up: { x: -4, y: 3 } }],
    );
    expect([at(doc, 'n1'), at(doc, 'n3')]).toEqual([
      { x: -4, y: 3 },
      { x: 30, y: 40 },
    ]);
  });

  it('does not drag a pipe: pressing on one and moving still ends in a plain select', () => {
    const before = dogLeg();
    const { doc, kinds } = gesture(
      before,
      [],
      [{ down: { x: 15, y: 0 } }, { move: { x: 15, y: 6 } }, { up: { x: 15, y: 6 } }],
    );
    expect(kinds).toEqual(['select']);
    expect(doc).toBe(before);
  });
});

describe('select tool: box select', () => {
  it('drags a box from empty ground and reports its corners; inBox finds the nodes and pipes wholly inside', () => {
    const doc = dogLeg();
    const { effects } = gesture(
      doc,
      [],
      [{ down: { x: 20, y: -5 } }, { move: { x: 28, y: 10 } }, { move: { x: 40, y: 45 } }, { up: { x: 40, y: 45 } }],
    );
    expect(effects).toEqual([{ kind: 'box', from: { x: 20, y: -5 }, to: { x: 40, y: 45 }, additive: false }]);
    const box = effects[0] as Extract<SelectEffect, { kind: 'box' }>;
    expect(inBox(doc, box.from, box.to)).toEqual({ nodes: ['n2', 'n3'], pipes: ['p2'] });
  });

  it('ignores moves and releases when no press began a gesture', () => {
    expect(gesture(dogLeg(), [], [{ move: { x: 1, y: 1 } }, { up: { x: 2, y: 2 } }]).effects).toEqual([]);
  });
});
