import { createStore, type StoreApi } from 'zustand/vanilla';
import { temporal, type TemporalState } from 'zundo';
import type { Project } from '@mainbrace/solver';
import type { PipeSpec, PlanPoint } from './documentEdits.js';
import type { Viewport } from './viewport.js';
import type { DrawState } from '../tools/drawTool.js';

export type ToolName = 'select' | 'draw' | 'pan';
/** Which thrusts the plan shows: one load case or the envelope of all. */
export type CaseView = { kind: 'case'; id: string } | { kind: 'envelope' };
export type DrawerTab = 'schedule' | 'profile' | 'cases' | 'soils';

export interface Selection {
  nodes: ReadonlySet<string>;
  pipes: ReadonlySet<string>;
}

/** The whole app state; only `project` is the design, and only it has undo history. */
export interface AppState {
  project: Project;
  viewport: Viewport;
  caseView: CaseView;
  drawer: { tab: DrawerTab; height: 'low' | 'high' | 'full' | 'closed' };
  tool: ToolName;
  snapping: boolean;
  pipeSpec: PipeSpec;
  draw: DrawState;
  /** nodes being dragged and where they are now; the document changes once, on drop */
  dragPreview: ReadonlyMap<string, PlanPoint> | null;
  selection: Selection;
  /** a message the chrome shows until dismissed (storage failure, a refused file) */
  notice: { tone: 'warning' | 'error' | 'info'; title: string; lines: string[] } | null;
}

export const EMPTY_SELECTION: Selection = { nodes: new Set(), pipes: new Set() };

export type AppStore = StoreApi<AppState> & { temporal: StoreApi<TemporalState<{ project: Project }>> };

/**
 * One vanilla store for the app (usable without React). The undo middleware wraps the combined
 * store and records only the project document: a change of view, tool or selection is not an edit.
 */
export function createAppStore(project: Project, pipeSpec: PipeSpec): AppStore {
  return createStore<AppState>()(
    temporal(
      (): AppState => ({
        project,
        viewport: { scale: 1, left: 0, top: 0 },
        caseView: { kind: 'envelope' },
        drawer: { tab: 'schedule', height: 'low' },
        tool: 'select',
        snapping: true,
        pipeSpec,
        draw: { phase: 'idle' },
        dragPreview: null,
        selection: EMPTY_SELECTION,
        notice: null,
      }),
      {
        partialize: (s) => ({ project: s.project }),
        equality: (a, b) => a.project === b.project,
        limit: 200,
      },
    ),
  ) as AppStore;
}
