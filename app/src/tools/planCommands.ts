import type { ActionName } from '../chrome/actionTable.js';
import { panBy, zoomAt } from '../state/viewport.js';
import { EMPTY_SELECTION, type ToolName } from '../state/slices.js';
import { drawWith } from './drawPointer.js';
import { fittedView, reveal } from './planView.js';
import {
  fitInsetRight,
  IDLE_GESTURE,
  KEY_PAN_FRACTION,
  KEY_ZOOM,
  type PlanDerived,
  type PlanInput,
  type PlanIntent,
} from './planInput.js';

type Outcome = { state: PlanInput; intents: PlanIntent[] };

const setTool = (s: PlanInput, tool: ToolName): PlanInput => ({
  ...s,
  tool,
  draw: { phase: 'idle' },
  gesture: IDLE_GESTURE,
  hover: { kind: 'none' },
});

/** Tab and Shift+Tab: the next or previous fitting in chainage order, selected and brought into view. */
function walk(s: PlanInput, step: 1 | -1, derived: PlanDerived): PlanInput {
  const order = derived.fittingOrder();
  if (order.length === 0) return s;
  const current = s.selection.nodes.size === 1 ? order.indexOf([...s.selection.nodes][0]!) : -1;
  const i = current < 0 ? (step === 1 ? 0 : order.length - 1) : (current + step + order.length) % order.length;
  const id = order[i]!;
  return reveal({ ...s, selection: { nodes: new Set([id]), pipes: new Set() } }, id);
}

/** A command given to the plan by key, tool strip or menu; commands it does not own go on as intents. */
export function planCommand(s: PlanInput, name: ActionName, derived: PlanDerived): Outcome {
  const drawing = s.draw.phase === 'drawing';
  const only = (state: PlanInput): Outcome => ({ state, intents: [] });
  const centre = { sx: (s.canvas.width - fitInsetRight(s)) / 2, sy: s.canvas.height / 2 };
  const panStep = Math.min(s.canvas.width, s.canvas.height) * KEY_PAN_FRACTION;
  switch (name) {
    case 'toolSelect':
      return only(setTool(s, 'select'));
    case 'toolDraw':
      return only(setTool(s, 'draw'));
    case 'toolPan':
      return only(setTool(s, 'pan'));
    case 'toggleSnapping':
      return only({ ...s, snapping: !s.snapping });
    case 'fit':
      return only({ ...s, viewport: fittedView(s) });
    case 'delete':
      if (drawing) return drawWith(s, { type: 'removeVertex' });
      return {
        state: s,
        intents: s.selection.nodes.size + s.selection.pipes.size ? [{ kind: 'deleteSelection' }] : [],
      };
    case 'cancel':
      if (drawing) return drawWith(s, { type: 'cancel' });
      return only({ ...s, selection: EMPTY_SELECTION, gesture: IDLE_GESTURE, selectBox: null, dragPreview: null });
    case 'finish':
      if (drawing) return drawWith(s, { type: 'finish' });
      return {
        state: s,
        intents: s.selection.nodes.size + s.selection.pipes.size === 1 ? [{ kind: 'openDetails' }] : [],
      };
    // Arrow keys move the view the way the arrow points: the plan slides the other way.
    case 'panLeft':
      return only({ ...s, viewport: panBy(s.viewport, panStep, 0) });
    case 'panRight':
      return only({ ...s, viewport: panBy(s.viewport, -panStep, 0) });
    case 'panUp':
      return only({ ...s, viewport: panBy(s.viewport, 0, panStep) });
    case 'panDown':
      return only({ ...s, viewport: panBy(s.viewport, 0, -panStep) });
    case 'zoomIn':
      return only({ ...s, viewport: zoomAt(s.viewport, centre, KEY_ZOOM) });
    case 'zoomOut':
      return only({ ...s, viewport: zoomAt(s.viewport, centre, 1 / KEY_ZOOM) });
    case 'nextFitting':
      return only(walk(s, 1, derived));
    case 'previousFitting':
      return only(walk(s, -1, derived));
    default:
      return { state: s, intents: [{ kind: 'command', name }] };
  }
}
