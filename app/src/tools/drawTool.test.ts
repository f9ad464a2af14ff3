import { describe, expect, it } from 'vitest';
import { analyse, type Project } from '@mainbrace/solver';
import { drawStep, rubberBand, type DrawContext, type DrawEvent, type DrawState } from './drawTool.js';
import { addRoute, type PlanPoint } from '../state/documentEdits.js';
import { hitTest } from '../plan/hitTest.js';
import { DN300, at, chain, emptyProject, expectClose, expectValid, links, project } from '../testFixtures.js';

const FREE: DrawContext = { snapping: false, lengthStep: 1, samePoint: 0.05 };
/** m, how near a click must be to a node or pipe to land on it (a few pixels at a usual zoom) */
const TOLERANCE = 0.5;

type Step = { click: PlanPoint } | { move: PlanPoint } | Exclude<DrawEvent['type'], 'click' | 'move'>;

/** Feeds plan-space events to the draw tool, hit-testing against the current document as the plan does. */
function draw(doc: Project, steps: Step[], ctx = FREE): { doc: Project; state: DrawState; commits: number } {
  let state: DrawState = { phase: 'idle' };
  let commits = 0;
  for (const s of steps) {
    const event: DrawEvent =
      typeof s === 'string'
        ? { type: s }
        : 'click' in s
          ? { type: 'click', at: s.click, hit: hitTest(doc, s.click, TOLERANCE) }
          : { type: 'move', at: s.move, hit: hitTest(doc, s.move, TOLERANCE) };
    const out = drawStep(state, event, ctx);
    state = out.state;
    if (out.commit) {
      doc = addRoute(doc, out.commit.start, out.commit.vertices, out.commit.end, DN300);
      commits++;
    }
  }
  return { doc, state, commits };
}
const clicks = (...pts: [number, number][]): Step[] => pts.map(([x, y]) => ({ click: { x, y } }));

/** A straight main Lowmoor 1 → 3 through a plain joint at (40, 0). */
const straight = () => chain([0, 0], [40, 0], [80, 0]);

describe('draw tool: a run by clicks', () => {
  it('draws a three-leg route from four clicks and finish: four nodes chained by three pipes of the chosen spec', () => {
    const { doc, state } = draw(emptyProject(), [...clicks([0, 0], [30, 0], [30, 40], [70, 40]), 'finish']);
    expect(state.phase).toBe('idle');
    expect(doc.nodes.map((n) => [n.id, n.x, n.y])).toEqual([
      ['n1', 0, 0],
      ['n2', 30, 0],
      ['n3', 30, 40],
      ['n4', 70, 40],
    ]);
    expect(links(doc)).toEqual(['n1→n2', 'n2→n3', 'n3→n4']);
    expect(
      doc.pipes.every((p) => p.outsideDiameter === DN300.outsideDiameter && p.insideDiameter === DN300.insideDiameter),
    ).toBe(true);
    expectValid(doc);
  });

  it('makes no zero-length pipe from a double-click: the second click at the same point is ignored', () => {
    const { doc } = draw(emptyProject(), [...clicks([0, 0], [30, 0], [30.01, 0]), 'finish']);
    expect(links(doc)).toEqual(['n1→n2']);
    expect(doc.nodes).toHaveLength(2);
    expectValid(doc);
  });

  it('cancels on Escape: the document is left as it was', () => {
    const before = straight();
    const { doc, state, commits } = draw(before, [...clicks([0, 20], [25, 20]), 'cancel', 'finish']);
    expect(state.phase).toBe('idle');
    expect(commits).toBe(0);
    expect(doc).toBe(before);
  });

  it('removes the last vertex and goes on drawing from the one before it', () => {
    const { doc } = draw(emptyProject(), [
      ...clicks([0, 0], [30, 0], [30, 40]),
      'removeVertex',
      ...clicks([60, 0]),
      'finish',
    ]);
    expect(doc.nodes.map((n) => [n.x, n.y])).toEqual([
      [0, 0],
      [30, 0],
      [60, 0],
    ]);
    expect(links(doc)).toEqual(['n1→n2', 'n2→n3']);
  });

  it('stops drawing when removeVertex is pressed with only the start placed, committing nothing', () => {
    const { state, commits } = draw(emptyProject(), [...clicks([5, 5]), 'removeVertex']);
    expect(state.phase).toBe('idle');
    expect(commits).toBe(0);
  });

  it('snaps the clicks when snapping is on: a first leg to bearing 0° and a whole 30 m, then a 45° turn of 28 m', () => {
    const { doc } = draw(emptyProject(), [...clicks([0, 0], [29.6, 1.2], [49, 21]), 'finish'], {
      ...FREE,
      snapping: true,
    });
    expect(at(doc, 'n2')).toEqual({ x: 30, y: 0 });
    // Hand calculation: raw leg (19, 21) turns 47.9° → 45°, length 28.3 m → 28 m; 28·cos 45° = 19.799 m (mm rounding).
    expect(at(doc, 'n3')).toEqual({ x: 49.799, y: 19.799 });
  });
});

describe('draw tool: runs that meet the existing route', () => {
  it('makes a tee where a run starts on an existing node (fitting kind from the solver)', () => {
    const before = straight();
    expect(analyse(before).byNode.has('n2')).toBe(false); // a plain joint needs no restraint
    const { doc } = draw(before, [...clicks([40, 0], [40, 25]), 'finish']);
    expect(links(doc)).toEqual(['n1→n2', 'n2→n3', 'n2→n4']);
    expect(analyse(doc).byNode.get('n2')?.geometry.kind).toBe('tee');
    expectValid(doc);
  });

  it('splits a pipe where a run starts on it, at the point of the pipe under the click', () => {
    const before = project(
      [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 50, y: 0 },
      ],
      [{ from: 'n1', to: 'n2' }],
    );
    const { doc } = draw(before, [...clicks([20, 0.3], [20, -30]), 'finish']);
    expect(at(doc, 'n3')).toEqual({ x: 20, y: 0 });
    expect(links(doc)).toEqual(['n1→n3', 'n3→n2', 'n3→n4']);
    expect(analyse(doc).byNode.get('n3')?.geometry.kind).toBe('tee');
    expectValid(doc);
  });

  it('joins an existing node when the run ends on it, without a click on finish', () => {
    const before = project(
      [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 50, y: 0 },
      ],
      [{ from: 'n1', to: 'n2' }],
    );
    const { doc, commits, state } = draw(before, clicks([0, 30], [50, 30], [50, 0.2]));
    expect(commits).toBe(1);
    expect(state.phase).toBe('idle');
    expect(links(doc)).toEqual(['n1→n2', 'n3→n4', 'n4→n2']);
    expect(doc.nodes).toHaveLength(4);
    expect(analyse(doc).byNode.get('n2')?.geometry.kind).toBe('bend');
  });

  it('splits the far side of a pipe when a loop starts and ends on that same pipe', () => {
    const before = project(
      [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 50, y: 0 },
      ],
      [{ from: 'n1', to: 'n2' }],
    );
    const { doc } = draw(before, clicks([10, 0], [10, 20], [40, 20], [40, 0]));
    expect(at(doc, 'n3')).toEqual({ x: 10, y: 0 });
    const end = doc.nodes.find((n) => n.x === 40 && n.y === 0);
    expect(end).toBeDefined();
    expect(links(doc)).toContain(`${end!.id}→n2`);
    expectValid(doc);
  });
});

describe('rubberBand', () => {
  it('reports the live length and the turn from the previous leg: 40 m and 90° after a leg east (hand calculation)', () => {
    const { state } = draw(emptyProject(), [...clicks([0, 0], [30, 0]), { move: { x: 30, y: 40 } }]);
    const band = rubberBand(state)!;
    expect(band.from).toEqual({ x: 30, y: 0 });
    expectClose(band.length, 40);
    expectClose(band.deflection!, 90, 1e-9);
  });

  it('has no deflection on the first leg (3-4-5 triangle: 5 m) and is absent when idle', () => {
    const { state } = draw(emptyProject(), [...clicks([1, 1]), { move: { x: 4, y: 5 } }]);
    expectClose(rubberBand(state)!.length, 5, 1e-12);
    expect(rubberBand(state)!.deflection).toBeNull();
    expect(rubberBand({ phase: 'idle' })).toBeNull();
  });
});
