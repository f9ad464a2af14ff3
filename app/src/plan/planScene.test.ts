import { describe, expect, it } from 'vitest';
import { analyse, horizontalNorm } from '@mainbrace/solver';
import { planScene } from './planScene.js';
import { EMPTY_SELECTION } from '../state/store.js';
import type { PlanPoint } from '../state/documentEdits.js';
import { expectClose, project } from '../testFixtures.js';

const ENVELOPE = { kind: 'envelope' } as const;
const CASES = [
  { id: 'test', pressure: 1.0e6 },
  { id: 'working', pressure: 0.6e6 },
];

/**
 * A 90° horizontal bend at n2 of DN300 (OD 0.326 m) at 1.0 MPa everywhere: in along +x from n1 at
 * (−20, 0), out along +y to n3 at (0, 30). With `ends` the line stops in caps, else in tie-ins.
 */
function bend(ends: 'cap' | 'tie-in') {
  return project(
    [
      { id: 'n1', x: -20, y: 0, end: ends },
      { id: 'n2', x: 0, y: 0 },
      { id: 'n3', x: 0, y: 30, end: ends },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
    CASES,
  );
}
const dot = (a: PlanPoint, b: PlanPoint) => a.x * b.x + a.y * b.y;
const dist = (a: PlanPoint, b: PlanPoint) => Math.hypot(a.x - b.x, a.y - b.y);

describe('planScene arrows', () => {
  it('points the bend arrow to the outside of the bend, (1, −1)/√2, as the thrust from analyse (docs/check-values.md CV-24)', () => {
    const doc = bend('tie-in');
    const analysis = analyse(doc);
    const scene = planScene(doc, analysis, ENVELOPE, EMPTY_SELECTION, null);
    expect(scene.arrows.map((a) => a.node)).toEqual(['n2']);
    const arrow = scene.arrows[0]!;
    const t = analysis.byNode.get('n2')!.envelope.governing.total;
    expectClose(arrow.direction.x, t[0] / horizontalNorm(t), 1e-12);
    expectClose(arrow.direction.y, t[1] / horizontalNorm(t), 1e-12);
    expectClose(arrow.direction.x, Math.SQRT1_2, 1e-9);
    expectClose(arrow.direction.y, -Math.SQRT1_2, 1e-9);
  });

  it('sizes the arrow from the shown case: 118.04 kN at 1.0 MPa on the envelope, 0.6 of it for the 0.6 MPa case (CV-9)', () => {
    const doc = bend('tie-in');
    expectClose(planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null).arrows[0]!.horizontal, 118.04e3, 10);
    expectClose(
      planScene(doc, analyse(doc), { kind: 'case', id: 'working' }, EMPTY_SELECTION, null).arrows[0]!.horizontal,
      0.6 * 118.04e3,
      10,
    );
  });

  it('draws one arrow per fitting with thrust, at the fitting: the bend and both caps, the caps pushed outward (§1.3)', () => {
    const doc = bend('cap');
    const analysis = analyse(doc);
    const scene = planScene(doc, analysis, ENVELOPE, EMPTY_SELECTION, null);
    expect(analysis.fittings).toHaveLength(3);
    expect(scene.arrows.map((a) => [a.node, a.at])).toEqual([
      ['n1', { x: -20, y: 0 }],
      ['n2', { x: 0, y: 0 }],
      ['n3', { x: 0, y: 30 }],
    ]);
    expectClose(scene.arrows[0]!.direction.x, -1, 1e-12);
    expectClose(scene.arrows[2]!.direction.y, 1, 1e-12);
    expect(scene.largestForce).toBe(Math.max(...scene.arrows.map((a) => a.horizontal)));
  });
});

describe('planScene bearing blocks', () => {
  it('puts the block on the thrust side of the bend, beyond the pipe, with the face width and depth of the sizing', () => {
    const doc = bend('tie-in');
    const f = analyse(doc).byNode.get('n2')!;
    const block = f.restraint.block!;
    const polygon = planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null).polygons.find(
      (p) => p.kind === 'block' && p.node === 'n2',
    )!;
    const thrust = { x: Math.SQRT1_2, y: -Math.SQRT1_2 };
    for (const q of polygon.points) expect(dot(q, thrust)).toBeGreaterThanOrEqual(0.326 / 2 - 1e-9);
    const [a, b, , d] = polygon.points as [PlanPoint, PlanPoint, PlanPoint, PlanPoint];
    expectClose(dist(a, d), block.faceWidth, 1e-9);
    expectClose(dist(a, b), block.depth, 1e-9);
  });
});

/** The 90° bend held by restrained joints instead of a block, at a laying length of `laying` m. */
function jointedBend(laying: number) {
  const doc = bend('tie-in');
  return {
    ...doc,
    design: { ...doc.design, layingLength: laying },
    nodes: doc.nodes.map((n) => (n.id === 'n2' ? { ...n, restraint: 'joints' as const } : n)),
  };
}

describe('planScene restrained zones', () => {
  it('gives each restrained leg a zone with a joint every laying length from the fitting, ⌈L/ℓ⌉ of them', () => {
    for (const laying of [6, 5.5, 2]) {
      const doc = jointedBend(laying);
      const f = analyse(doc).byNode.get('n2')!;
      const scene = planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null);
      expect(scene.zones.map((z) => z.pipe).sort()).toEqual(f.restraint.restrainedLegs.map((l) => l.pipe).sort());
      for (const z of scene.zones) {
        const L = f.restraint.restrainedLegs.find((l) => l.pipe === z.pipe)!.length;
        expect(L).toBeGreaterThan(0);
        expect(L).toBeLessThan(20); // within the shorter pipe, so every joint is drawn
        // Hand count: joints at 0, ℓ, 2ℓ … closer to the fitting than L.
        const expected: number[] = [];
        for (let d = 0; d < L; d += laying) expected.push(d);
        expect(z.joints).toBe(expected.length);
        z.jointsAt.forEach((d, i) => expectClose(d, expected[i]!, 1e-9));
        expectClose(z.planLength, L, 1e-9); // a level pipe: plan length is pipe length
        expect(z.at).toEqual({ x: 0, y: 0 });
      }
    }
  });

  it('stands each dimension line outside the bend, away from the other pipe', () => {
    const doc = jointedBend(6);
    const zones = planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null).zones;
    const west = zones.find((z) => z.pipe === 'p1')!; // toward n1 at (−20, 0)
    const north = zones.find((z) => z.pipe === 'p2')!; // toward n3 at (0, 30)
    expectClose(west.direction.x, -1, 1e-12);
    expectClose(north.direction.y, 1, 1e-12);
    // Left of west is south, left of north is west: outside the bend is south for one, east for the other.
    expect(west.side).toBe(1);
    expect(north.side).toBe(-1);
  });

  it('draws no bands: zones replace them, and blocks, anchors and pads stay polygons', () => {
    const doc = jointedBend(6);
    const scene = planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null);
    expect(scene.polygons.filter((p) => p.node === 'n2')).toEqual([]);
    expect(scene.zones.length).toBe(2);
  });
});

describe('planScene while nodes are dragged', () => {
  it('draws a moved node where it is now, with no arrow and no block until the drop', () => {
    const doc = bend('cap');
    const moved = new Map([['n2', { x: 4, y: -3 }]]);
    const scene = planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, moved);
    expect(scene.arrows.map((a) => a.node)).toEqual(['n1', 'n3']);
    expect(scene.polygons.some((p) => p.node === 'n2')).toBe(false);
    expect(scene.fittings.find((f) => f.node === 'n2')!.at).toEqual({ x: 4, y: -3 });
    expect(scene.pipes.map((p) => [p.a, p.b])).toEqual([
      [
        { x: -20, y: 0 },
        { x: 4, y: -3 },
      ],
      [
        { x: 4, y: -3 },
        { x: 0, y: 30 },
      ],
    ]);
  });

  it('marks selected pipes and fittings and lists tie-ins as plain nodes', () => {
    const doc = bend('tie-in');
    const scene = planScene(doc, analyse(doc), ENVELOPE, { nodes: new Set(['n2']), pipes: new Set(['p1']) }, null);
    expect(scene.pipes.map((p) => p.selected)).toEqual([true, false]);
    expect(scene.fittings.map((f) => [f.node, f.selected])).toEqual([['n2', true]]);
    expect(scene.plainNodes.map((n) => [n.id, n.tieIn])).toEqual([
      ['n1', true],
      ['n3', true],
    ]);
  });

  it('labels the bend and both tie-ins with their marks along the run: A1, A2, A3 (docs/project-format.md, Marks)', () => {
    const doc = bend('tie-in');
    const scene = planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null);
    expect(scene.fittings.map((f) => [f.node, f.mark])).toEqual([['n2', 'A2']]);
    expect(scene.plainNodes.map((n) => [n.id, n.mark])).toEqual([
      ['n1', 'A1'],
      ['n3', 'A3'],
    ]);
  });
});

describe('planScene parts kept from the last scene of the same route', () => {
  // Invariant: a scene made after edits (its unchanged parts taken from the caches) equals the scene of
  // a deep copy of the same document, which shares no array with it and so is made from scratch.
  it('equals a scene made from scratch after a pressure edit, a move, a selection and a drag', () => {
    const doc = bend('cap');
    planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null);
    const pressed = { ...doc, loadCases: doc.loadCases.map((c) => ({ ...c, pressure: c.pressure * 1.7 })) };
    const moved = { ...pressed, nodes: pressed.nodes.map((n) => (n.id === 'n3' ? { ...n, x: 5 } : n)) };
    const picked = { nodes: new Set(['n2']), pipes: new Set([doc.pipes[0]!.id]) };
    const drag = new Map([['n3', { x: 9, y: 31 }]]);
    for (const [d, sel, preview] of [
      [pressed, EMPTY_SELECTION, null],
      [moved, EMPTY_SELECTION, null],
      [moved, picked, null],
      [moved, picked, drag],
    ] as const) {
      const kept = planScene(d, analyse(d), ENVELOPE, sel, preview);
      const copy = structuredClone(d);
      expect(kept).toEqual(planScene(copy, analyse(copy), ENVELOPE, sel, preview));
    }
  });

  it('hands back the very same pipes and plain nodes after a pressure edit', () => {
    const doc = bend('tie-in');
    const a = planScene(doc, analyse(doc), ENVELOPE, EMPTY_SELECTION, null);
    const pressed = { ...doc, loadCases: doc.loadCases.map((c) => ({ ...c, pressure: c.pressure / 2 })) };
    const b = planScene(pressed, analyse(pressed, analyse(doc)), ENVELOPE, EMPTY_SELECTION, null);
    expect(b.pipes).toBe(a.pipes);
    expect(b.plainNodes).toBe(a.plainNodes);
    expect(b.arrows).not.toEqual(a.arrows);
  });
});
