import type { Project, UnitSystem } from '@mainbrace/solver';
import type { PipeSpec, PlanPoint } from './documentEdits.js';
import type { Viewport } from './viewport.js';
import type { DrawState } from '../tools/drawTool.js';

export type ToolName = 'select' | 'draw' | 'pan';
/** Which thrusts the plan shows: one load case or the envelope of all. */
export type CaseView = { kind: 'case'; id: string } | { kind: 'envelope' };
export type DrawerTab = 'schedule' | 'profile' | 'cases' | 'soils' | 'sheet';

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
  caseView: CaseView;
  drawer: { tab: DrawerTab; height: 'low' | 'high' | 'full' | 'closed' };
  /** a message the chrome shows until dismissed (storage failure, a refused file) */
  notice: Notice | null;
}

/** The active tool and its transient state. */
export interface ToolSlice {
  tool: ToolName;
  snapping: boolean;
  pipeSpec: PipeSpec;
  draw: DrawState;
  /** nodes being dragged and where they are now; the document changes once, on drop */
  dragPreview: ReadonlyMap<string, PlanPoint> | null;
}

export interface SelectionSlice {
  selection: Selection;
}

export const projectSlice = (project: Project): ProjectSlice => ({ project });

export const viewSlice = (units: UnitSystem): ViewSlice => ({
  units,
  viewport: { scale: 1, left: 0, top: 0 },
  caseView: { kind: 'envelope' },
  drawer: { tab: 'schedule', height: 'low' },
  notice: null,
});

export const toolSlice = (pipeSpec: PipeSpec): ToolSlice => ({
  tool: 'select',
  snapping: true,
  pipeSpec,
  draw: { phase: 'idle' },
  dragPreview: null,
});

export const selectionSlice = (): SelectionSlice => ({ selection: EMPTY_SELECTION });
