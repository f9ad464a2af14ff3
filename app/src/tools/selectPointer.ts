import { inBox } from '../plan/hitTest.js';
import type { ScreenPoint } from '../state/viewport.js';
import type { Selection } from '../state/slices.js';
import { selectStep, type SelectContext, type SelectEffect } from './selectTool.js';
import { hitAt, planAt } from './planGeometry.js';
import { startPan } from './panGesture.js';
import { DRAG_PX, HIT_PX, IDLE_GESTURE, type PlanInput, type PlanIntent, type PointerKind } from './planInput.js';

const context = (s: PlanInput, pointer: PointerKind): SelectContext => ({
  dragThreshold: DRAG_PX[pointer === 'mouse' ? 'mouse' : 'touch'] / s.viewport.scale,
  selectedNodes: s.selection.nodes,
  nodeAt: (id) => {
    const n = s.project.nodes.find((x) => x.id === id);
    return n ? { x: n.x, y: n.y } : undefined;
  },
});

/** The select tool, pressed: on a node or pipe it selects (and may drag); on empty ground it pans, or boxes with Shift. */
export function selectDown(s: PlanInput, id: number, pointer: PointerKind, at: ScreenPoint, shift: boolean): PlanInput {
  const hit = hitAt(s, at, HIT_PX[pointer === 'mouse' ? 'mouse' : 'touch']);
  if (hit.kind === 'none' && !shift) return startPan(s, id, at, true);
  const out = selectStep(
    { phase: 'idle' },
    { type: 'down', at: planAt(s, at), hit, additive: shift },
    context(s, pointer),
  );
  return { ...s, gesture: { kind: 'select', pointer: id, select: out.state }, hover: hit };
}

export function selectMove(s: PlanInput, pointer: PointerKind, at: ScreenPoint): PlanInput {
  if (s.gesture.kind !== 'select') return s;
  const out = selectStep(s.gesture.select, { type: 'move', at: planAt(s, at) }, context(s, pointer));
  const next: PlanInput = { ...s, gesture: { ...s.gesture, select: out.state } };
  if (out.effect?.kind === 'preview') next.dragPreview = out.effect.positions;
  if (out.state.phase === 'boxing') next.selectBox = { from: out.state.origin, to: out.state.current };
  return next;
}

function selectionAfter(s: PlanInput, effect: SelectEffect): Selection {
  if (effect.kind === 'box') {
    const found = inBox(s.project, effect.from, effect.to);
    const base = effect.additive ? s.selection : { nodes: new Set<string>(), pipes: new Set<string>() };
    return { nodes: new Set([...base.nodes, ...found.nodes]), pipes: new Set([...base.pipes, ...found.pipes]) };
  }
  if (effect.kind !== 'select') return s.selection;
  const h = effect.hit;
  if (h.kind === 'none') return effect.additive ? s.selection : { nodes: new Set(), pipes: new Set() };
  const key = h.kind === 'node' ? 'nodes' : 'pipes';
  if (!effect.additive)
    return { nodes: new Set(key === 'nodes' ? [h.id] : []), pipes: new Set(key === 'pipes' ? [h.id] : []) };
  const next = new Set(s.selection[key]);
  if (next.has(h.id)) next.delete(h.id);
  else next.add(h.id);
  return { ...s.selection, [key]: next };
}

/** Released: a click selects, a drag moves the nodes (one edit), a box selects what lies wholly inside. */
export function selectUp(
  s: PlanInput,
  pointer: PointerKind,
  at: ScreenPoint,
): { state: PlanInput; intents: PlanIntent[] } {
  if (s.gesture.kind !== 'select') return { state: s, intents: [] };
  const out = selectStep(s.gesture.select, { type: 'up', at: planAt(s, at) }, context(s, pointer));
  const state: PlanInput = { ...s, gesture: IDLE_GESTURE, selectBox: null };
  if (!out.effect) return { state, intents: [] };
  if (out.effect.kind === 'move')
    return {
      state: { ...state, dragPreview: null },
      intents: [{ kind: 'moveNodes', positions: out.effect.positions }],
    };
  return { state: { ...state, selection: selectionAfter(s, out.effect) }, intents: [] };
}
