import type { ImagePoint, Project, UnitSystem } from '@mainbrace/solver';
import type { PipeSpec, PlanPoint } from './documentEdits.js';
import type { Viewport } from './viewport.js';
import type { DrawState } from '../tools/drawTool.js';
import type { Gesture } from '../tools/planInput.js';
import type { Hit } from '../tools/hit.js';
import type { ScreenPoint } from './viewport.js';

export type ToolName = 'select' | 'draw' | 'pan';
/** Which thrusts the plan shows: one load case or the envelope of all. */
export type CaseView = { kind: 'case'; id: string } | { kind: 'envelope' };
export type DrawerTab = 'schedule' | 'profile' | 'cases' | 'soils' | 'underlay';

export interface Selection {
  nodes: ReadonlySet<string>;
  pipes: ReadonlySet<string>;
}

export const EMPTY_SELECTION: Selection = { nodes: new Set(), pipes: new Set() };

/** The design: the only state with undo history, and the only state saved. */
export interface ProjectSlice {
  project: Project;
}

/** A choice offered inside a notice (keep this tab's version, save to a file...). */
export interface NoticeAction {
  label: string;
  run: () => void;
}

/** A message the chrome shows until dismissed. */
export interface Notice {
  tone: 'warning' | 'error' | 'info';
  title: string;
  lines: string[];
  actions?: NoticeAction[];
}

/** How the plan and the panels are shown. */
export interface ViewSlice {
  /** display units: a view setting, saved into the file but never an undo step of the design */
  units: UnitSystem;
  viewport: Viewport;
  /** the plan canvas's size, CSS px (0 × 0 until the plan is laid out) */
  canvas: { width: number; height: number };
  /** whether the plan's legend is open; while open, Fit keeps the route out from under it */
  legendOpen: boolean;
  caseView: CaseView;
  drawer: { tab: DrawerTab; height: 'low' | 'high' | 'full' | 'closed' };
  /** a message the chrome shows until dismissed (storage failure, a refused file) */
  notice: Notice | null;
  /** the document as last saved to or opened from a file, or as the demo opened; null when unknown */
  fileBaseline: Project | null;
  /** the document when a live edit (the test-pressure slider) began: the plan holds its arrow scale and shows growth against it */
  liveBase: Project | null;
}

/** The active tool and its transient state. */
export interface ToolSlice {
  tool: ToolName;
  snapping: boolean;
  pipeSpec: PipeSpec;
  draw: DrawState;
  /** nodes being dragged and where they are now; the document changes once, on drop */
  dragPreview: ReadonlyMap<string, PlanPoint> | null;
  /** image points picked on the plan to calibrate the underlay; null when not picking */
  underlayPick: readonly ImagePoint[] | null;
  /** the typed entry while drawing, '' when none */
  typed: string;
  /** why the last typed entry was not placed; null when it was */
  typedError: string | null;
  /** the pointer gesture in progress on the plan */
  gesture: Gesture;
  /** touch points down on the plan, by pointer id */
  touches: Readonly<Record<number, ScreenPoint>>;
  /** what a click at the pointer would select or join */
  hover: Hit;
  selectBox: { from: PlanPoint; to: PlanPoint } | null;
  /** Space held: any drag pans */
  spaceHeld: boolean;
}

export interface SelectionSlice {
  selection: Selection;
}

export const projectSlice = (project: Project): ProjectSlice => ({ project });

export const viewSlice = (units: UnitSystem): ViewSlice => ({
  units,
  viewport: { scale: 1, left: 0, top: 0 },
  canvas: { width: 0, height: 0 },
  legendOpen: true,
  caseView: { kind: 'envelope' },
  drawer: { tab: 'schedule', height: 'low' },
  notice: null,
  fileBaseline: null,
  liveBase: null,
});

export const toolSlice = (pipeSpec: PipeSpec): ToolSlice => ({
  tool: 'select',
  snapping: true,
  pipeSpec,
  draw: { phase: 'idle' },
  dragPreview: null,
  underlayPick: null,
  typed: '',
  typedError: null,
  gesture: { kind: 'idle' },
  touches: {},
  hover: { kind: 'none' },
  selectBox: null,
  spaceHeld: false,
});

export const selectionSlice = (): SelectionSlice => ({ selection: EMPTY_SELECTION });
