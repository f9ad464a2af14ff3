import { createStore, type StoreApi } from 'zustand/vanilla';
import { temporal, type TemporalState } from 'zundo';
import type { Project } from '@mainbrace/solver';
import type { PipeSpec } from './documentEdits.js';
import {
  projectSlice,
  selectionSlice,
  toolSlice,
  viewSlice,
  type ProjectSlice,
  type SelectionSlice,
  type ToolSlice,
  type ViewSlice,
} from './slices.js';

export { EMPTY_SELECTION } from './slices.js';
export type { CaseView, DrawerTab, Notice, NoticeAction, Selection, ToolName } from './slices.js';

/** The whole app state; only `project` is the design, and only it has undo history. */
export type AppState = ProjectSlice & ViewSlice & ToolSlice & SelectionSlice;

export type AppStore = StoreApi<AppState> & { temporal: StoreApi<TemporalState<{ project: Project }>> };

/**
 * One vanilla store for the app (usable without React), built from its slices. The undo middleware
 * wraps the combined store and records only the project document: a change of view, tool or
 * selection is not an edit.
 */
export function createAppStore(project: Project, pipeSpec: PipeSpec): AppStore {
  return createStore<AppState>()(
    temporal(
      (): AppState => ({
        ...projectSlice(project),
        ...viewSlice(project.units),
        ...toolSlice(pipeSpec),
        ...selectionSlice(),
      }),
      {
        partialize: (s) => ({ project: s.project }),
        equality: (a, b) => a.project === b.project,
        limit: 200,
      },
    ),
  ) as AppStore;
}
