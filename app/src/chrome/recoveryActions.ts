import type { Project } from '@mainbrace/solver';
import type { KeyValueStore } from '../state/keyValue.js';
import type { AppStore } from '../state/store.js';
import type { Actions } from '../state/actions.js';
import type { Autosave } from '../state/autosave.js';
import { keepStoredProject, setAsideStoredProject, storedProjectText } from '../state/recovery.js';
import { leaveNoticeForNextStart } from '../state/startNotice.js';
import { importOrReload } from './loadChunk.js';
import { download, fileStem, projectText } from '../files/saveFile.js';

/** What the error screen can do: each way out keeps the project that failed as a kept copy. */
export interface Recovery {
  /** the project as kept in storage (the one every reload opens), even if it no longer reads */
  downloadKept(): Promise<void>;
  /** sets the kept project aside and starts again without it */
  startWithout(): Promise<void>;
  /** opens a project file instead; the problems if it was refused */
  open(file: File): Promise<string[] | null>;
  /** a new blank project instead */
  startNew(): Promise<void>;
}

const SET_ASIDE = 'set aside from the error screen';

export function createRecovery(kv: KeyValueStore, store: AppStore, actions: Actions, autosave: Autosave): Recovery {
  const replaceWith = async (project: Project) => {
    await autosave.flush(); // the last edits of the failing project go into its kept copy
    await keepStoredProject(kv, SET_ASIDE).catch(() => null);
    actions.replaceProject(project);
  };
  return {
    async downloadKept() {
      const current = store.getState().project;
      const text = (await storedProjectText(kv).catch(() => null)) ?? projectText(current);
      download(`${fileStem(current)}-kept.json`, text, 'application/json');
    },
    async startWithout() {
      await autosave.flush();
      autosave.stop();
      const copy = await setAsideStoredProject(kv, SET_ASIDE);
      leaveNoticeForNextStart({
        tone: 'info',
        title: copy
          ? `Started without the kept project “${copy.name ?? 'unnamed'}”: it is in Kept copies, where you can download it`
          : 'Started without a kept project',
        lines: [],
      });
      window.location.reload();
    },
    async open(file) {
      const { readProjectFile } = await importOrReload(() => import('../files/projectFile.js'));
      const r = await readProjectFile(file);
      if (!r.ok) return r.lines;
      await replaceWith(r.project);
      return null;
    },
    async startNew() {
      const { blankProject } = await importOrReload(() => import('../files/blankProject.js'));
      await replaceWith(blankProject());
    },
  };
}
