import type { ImagePoint, Project, UnitSystem } from '@mainbrace/solver';
import type { PlanPoint, RouteEnd } from '../state/documentEdits.js';
import type { ScreenPoint, Viewport } from '../state/viewport.js';
import type { Selection, ToolName } from '../state/slices.js';
import type { ActionName } from '../chrome/actionTable.js';
import type { DrawState } from './drawTool.js';
import type { SelectState } from './selectTool.js';
import type { Hit } from './hit.js';

export type PointerKind = 'mouse' | 'touch' | 'pen';

/** What the plan hears from the browser, in screen pixels of the plan canvas. */
export type PlanEvent =
  | {
      type: 'pointerDown';
      id: number;
      pointer: PointerKind;
      button: number;
      at: ScreenPoint;
      shift: boolean;
      alt: boolean;
    }
  | { type: 'pointerMove'; id: number; pointer: PointerKind; at: ScreenPoint; alt: boolean }
  | { type: 'pointerUp'; id: number; pointer: PointerKind; at: ScreenPoint }
  | { type: 'pointerCancel'; id: number }
  | { type: 'pointerLeave' }
  | { type: 'doubleClick'; at: ScreenPoint }
  | { type: 'wheel'; at: ScreenPoint; deltaY: number }
  | { type: 'key'; key: string; shift: boolean; ctrl: boolean; meta: boolean; alt: boolean; planFocused: boolean }
  | { type: 'keyUp'; key: string }
  | { type: 'command'; name: ActionName }
  | { type: 'resize'; width: number; height: number }
  /** the typed-entry box's text changed (typed input while drawing) */
  | { type: 'typedText'; text: string }
  /** Enter in the typed-entry box: place the node it describes, or finish the run when empty */
  | { type: 'typedEnter' };

/** The gesture in progress: what the pointers pressed on the plan are doing. */
export type Gesture =
  | { kind: 'idle' }
  /** dragging the view; a short press on empty ground with `clearOnClick` clears the selection */
  | { kind: 'pan'; pointer: number; start: ScreenPoint; last: ScreenPoint; clearOnClick: boolean }
  | { kind: 'select'; pointer: number; select: SelectState }
  /** a finger down with the draw tool: a tap places a point, a drag pans */
  | { kind: 'drawPress'; pointer: number; start: ScreenPoint; last: ScreenPoint; panning: boolean; alt: boolean }
  | { kind: 'pinch'; a: number; b: number; startDistance: number; startMid: ScreenPoint; startViewport: Viewport }
  /** a pinch lost a finger: nothing until every finger is up */
  | { kind: 'spent' };

export const IDLE_GESTURE: Gesture = { kind: 'idle' };

/**
 * The state the dispatcher reads and returns: the design (read only), selection, tool, view and the
 * gesture. Everything but the design lives outside the undo history.
 */
export interface PlanInput {
  readonly project: Project;
  selection: Selection;
  tool: ToolName;
  snapping: boolean;
  units: UnitSystem;
  viewport: Viewport;
  canvas: { width: number; height: number };
  /** whether the plan's legend is open: Fit keeps the route out from under it */
  legendOpen: boolean;
  gesture: Gesture;
  /** touch pointers down, by pointer id */
  touches: Readonly<Record<number, ScreenPoint>>;
  draw: DrawState;
  /** what a click here would select or attach to */
  hover: Hit;
  dragPreview: ReadonlyMap<string, PlanPoint> | null;
  selectBox: { from: PlanPoint; to: PlanPoint } | null;
  spaceHeld: boolean;
  /** image points picked to calibrate the site-plan underlay; null when not picking */
  underlayPick: readonly ImagePoint[] | null;
  /** the typed entry while drawing (a length, turn, bearing or coordinates), '' when none */
  typed: string;
  /** why the last typed entry was not placed, in words; null when it was */
  typedError: string | null;
}

/** What the dispatcher asks of the rest of the app: design edits and commands outside the plan. */
export type PlanIntent =
  | { kind: 'addRun'; start: RouteEnd; vertices: PlanPoint[]; end: RouteEnd | null }
  | { kind: 'moveNodes'; positions: ReadonlyMap<string, PlanPoint> }
  | { kind: 'deleteSelection' }
  /** show the details of the selection and move the keyboard there */
  | { kind: 'openDetails' }
  /** a command the plan does not own (undo, save, open…) */
  | { kind: 'command'; name: ActionName };

export interface PlanOutcome {
  state: PlanInput;
  intents: PlanIntent[];
}

/** Derived facts the dispatcher may ask for, computed only when asked. */
export interface PlanDerived {
  /** fitting node ids in chainage order (run letter, then number) */
  fittingOrder: () => readonly string[];
}

/** Screen tolerances, px: what counts as "on" a node or pipe, and how far a press moves before it drags. */
export const HIT_PX = { mouse: 9, touch: 22 } as const;
/** While drawing, a click this close to a node or pipe joins it (a click 12 px off a pipe should join it). */
export const ATTACH_PX = { mouse: 16, touch: 26 } as const;
export const DRAG_PX = { mouse: 4, touch: 10 } as const;
/** Legend width kept clear by Fit while the legend is open, px (its CSS width, 230, and margins). */
export const LEGEND_INSET_PX = 250;
/** Below this canvas width the legend starts closed: open, it would leave the route too little room. */
export const LEGEND_MIN_CANVAS_PX = 900;

/** px kept clear of the route on the right (the open legend, when the canvas is wide enough to spare it). */
export const fitInsetRight = (s: Pick<PlanInput, 'legendOpen' | 'canvas'>) =>
  s.legendOpen && s.canvas.width - LEGEND_INSET_PX > 300 ? LEGEND_INSET_PX : 0;

/** A key press pans by this much of the canvas, and zooms by this factor. */
export const KEY_PAN_FRACTION = 0.1;
export const KEY_ZOOM = 1.25;
