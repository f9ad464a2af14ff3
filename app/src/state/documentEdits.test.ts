import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Project } from '@mainbrace/solver';
import { addRoute, deleteItems, moveNodes, nextId, splitPipe } from './documentEdits.js';
import { at, DN300, emptyProject, expectClose, expectValid, links, project } from '../testFixtures.js';

/** A sloping main n1 → n2 with a flow and a label, and a branch n2 → n4 off a run n2 → n3. */
const sloping = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0, z: 100, cover: 1.0 },
      { id: 'n2', x: 40, y: 0, z: 104, cover: 2.0 },
    ],
    [{ from: 'n1', to: 'n2', flow: 0.03, label: 'Trunk under Quarry Row' }],
  );
const branched = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 30, y: 0 },
      { id: 'n3', x: 60, y: 0 },
      { id: 'n4', x: 30, y: 25 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
      { from: 'n2', to: 'n4' },
    ],
  );
const none = new Set<string>();

describe('nextId', () => {
  it('continues after the largest number with that prefix, ignoring other prefixes and suffixes', () => {
    expect(nextId('n', ['n1', 'n7', 'p9', 'n10x', 'pn12', 'n3'])).toBe('n8');
    expect(nextId('p', [])).toBe('p1');
  });
});

describe('splitPipe', () => {
  it('puts the new node on the pipe with elevation and cover interpolated (hand calculation: t = 10/40 = 0.25)', () => {
    const { project: doc, nodeId } = splitPipe(sloping(), 'p1', { x: 10, y: 3 });
    const n = doc.nodes.find((x) => x.id === nodeId)!;
    expect([n.x, n.y]).toEqual([10, 0]);
    expectClose(n.elevation, 100 + 0.25 * 4);
    expectClose(n.cover, 1.0 + 0.25 * 1.0);
    expect(links(doc)).toEqual(['n1→n3', 'n3→n2']);
    expectValid(doc);
  });

  it('gives the second piece the same flow, diameters and material as the pipe it came from', () => {
    const { project: doc } = splitPipe(sloping(), 'p1', { x: 25, y: -1 });
    const [first, second] = doc.pipes;
    expect(second!.flow).toBe(0.03);
    expect([second!.outsideDiameter, second!.insideDiameter, second!.material]).toEqual([
      first!.outsideDiameter,
      first!.insideDiameter,
      first!.material,
    ]);
  });

  it('keeps the new node off the pipe ends when the point lies beyond them, so no pipe has zero length', () => {
    const { project: doc, nodeId } = splitPipe(sloping(), 'p1', { x: -5, y: 0 });
    expect(at(doc, nodeId).x).toBeGreaterThan(0);
    expectValid(doc);
  });
});

describe('addRoute', () => {
  it('leaves no node without a pipe when a vertex lies within 1 cm of the one before it', () => {
    const doc = addRoute(
      emptyProject(),
      { kind: 'point', at: { x: 0, y: 0 } },
      [
        { x: 0.004, y: 0 },
        { x: 20, y: 0 },
      ],
      null,
      DN300,
    );
    expect(links(doc)).toEqual(['n1→n2']);
    expect(doc.nodes.map((n) => n.id)).toEqual(['n1', 'n2']);
    expectValid(doc);
  });
});

describe('deleteItems', () => {
  it('takes the dangling end of a deleted branch with it but keeps the tee node, which still has pipes', () => {
    const doc = deleteItems(branched(), none, new Set(['p3']));
    expect(doc.nodes.map((n) => n.id)).toEqual(['n1', 'n2', 'n3']);
    expect(links(doc)).toEqual(['n1→n2', 'n2→n3']);
    expectValid(doc);
  });

  it('deletes a node with every pipe that meets it, and the nodes those pipes leave alone', () => {
    const doc = deleteItems(branched(), new Set(['n2']), none);
    expect(doc.nodes).toEqual([]);
    expect(doc.pipes).toEqual([]);
    expectValid(doc);
  });

  it('takes a bend out of the line: its two pipes become one between the neighbours, flow kept', () => {
    const chain = project(
      [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 30, y: 10 },
        { id: 'n3', x: 60, y: 0 },
      ],
      [
        { from: 'n1', to: 'n2', flow: 0.02 },
        { from: 'n2', to: 'n3', flow: 0.02 },
      ],
    );
    const doc = deleteItems(chain, new Set(['n2']), none);
    expect(doc.nodes.map((n) => n.id)).toEqual(['n1', 'n3']);
    expect(links(doc)).toEqual(['n1→n3']);
    expect(doc.pipes[0]!.flow).toBe(0.02);
    expectValid(doc);
  });

  it('keeps a node that had no pipe before the delete (it was not left dangling by it)', () => {
    const base = { ...branched(), nodes: [...branched().nodes, { ...branched().nodes[0]!, id: 'n9', x: -50 }] };
    expect(deleteItems(base, none, new Set(['p1'])).nodes.map((n) => n.id)).toEqual(['n2', 'n3', 'n4', 'n9']);
  });
});

describe('moveNodes', () => {
  it('moves the named nodes to the millimetre and leaves the rest, with pipes following', () => {
    const doc = moveNodes(branched(), new Map([['n4', { x: 31.23456, y: 24.00049 }]]));
    expect(at(doc, 'n4')).toEqual({ x: 31.235, y: 24 });
    expect(at(doc, 'n1')).toEqual({ x: 0, y: 0 });
    expect(links(doc)).toEqual(links(branched()));
    expectValid(doc);
  });

  it('refuses a move that would put a node on top of its neighbour (a pipe with no length)', () => {
    const before = branched();
    expect(moveNodes(before, new Map([['n4', { x: 30, y: 0.0001 }]]))).toBe(before);
  });
});

describe('every edit keeps the document valid (invariant, parsed by the solver)', () => {
  it('holds for random runs, splits, moves and deletes', () => {
    const pt = fc.record({ x: fc.integer({ min: -200, max: 200 }), y: fc.integer({ min: -200, max: 200 }) });
    const pick = fc.double({ min: 0, max: 0.999, noNaN: true });
    fc.assert(
      fc.property(
        fc.array(pt, { minLength: 2, maxLength: 6 }),
        pick,
        pt,
        pick,
        fc.option(pick),
        pt,
        pick,
        (run, which, splitAt, mover, onto, to, victim) => {
          const choose = <T>(xs: readonly T[], u: number) => xs[Math.floor(u * xs.length)]!;
          let doc: Project = addRoute(branched(), { kind: 'node', id: 'n4' }, run, null, DN300);
          expectValid(doc);
          doc = splitPipe(doc, choose(doc.pipes, which).id, splitAt).project;
          expectValid(doc);
          // Half the moves drop a node exactly onto another node, the case most likely to collapse a pipe.
          doc = moveNodes(
            doc,
            new Map([[choose(doc.nodes, mover).id, onto === null ? to : at(doc, choose(doc.nodes, onto).id)]]),
          );
          expectValid(doc);
          doc = deleteItems(doc, new Set([choose(doc.nodes, victim).id]), none);
          expectValid(doc);
        },
      ),
      { seed: 4711, numRuns: 200 },
    );
  });
});
