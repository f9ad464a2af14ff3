import { checkProjectText } from '../state/projectCheck.js';
import { prepareResults } from '../state/results.js';
import type { Project } from '@mainbrace/solver';

/** Largest project file the app opens, bytes: a route of 10,000 fittings is about 5 MB. */
export const MAX_FILE_BYTES = 20 * 1024 * 1024;

export type OpenResult = { ok: true; project: Project } | { ok: false; lines: string[] };

/** Reads and validates a project file; never throws, and never touches the current project. */
export async function readProjectFile(file: File): Promise<OpenResult> {
  if (file.size > MAX_FILE_BYTES) {
    return {
      ok: false,
      lines: [`${file.name}: the file is ${(file.size / 1048576).toFixed(1)} MB; project files over 20 MB are refused`],
    };
  }
  let text: string;
  try {
    text = await file.text();
  } catch (e) {
    return { ok: false, lines: [`${file.name}: the file could not be read (${(e as Error).message})`] };
  }
  // A long file is checked in a worker (a 10,000-node route: over a second of JSON.parse and schema).
  return checkProjectText(text, 'file');
}

/**
 * Opens a dropped or chosen file: the project is replaced only if the file is valid, and only once `agree`
 * lets it (where the open project has changes not saved to a file); the user is told.
 */
export async function openProjectFile(
  file: File,
  actions: {
    replaceProject: (p: Project) => void;
    markSaved?: (p: Project) => void;
    notify: (n: { tone: 'info' | 'error'; title: string; lines: string[] }) => void;
  },
  agree: (open: () => void) => void = (open) => open(),
): Promise<void> {
  const r = await readProjectFile(file);
  if (r.ok) {
    const project = r.project;
    await prepareResults(project, project.units);
    agree(() => {
      actions.replaceProject(project);
      actions.markSaved?.(project);
      actions.notify({ tone: 'info', title: `Opened ${file.name}`, lines: [] });
    });
  } else
    actions.notify({ tone: 'error', title: `${file.name} was not opened — your project is unchanged`, lines: r.lines });
}
