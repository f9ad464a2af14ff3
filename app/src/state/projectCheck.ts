import { problemText, quickParse, type Project } from '@mainbrace/solver';
import { loadChecks } from './checks.js';
import { projectFromText } from './restore.js';

export interface CheckRequest {
  id: number;
  text: string;
  /** whose words the refusal uses: a project file's (with line and column) or a stored copy's */
  words: 'file' | 'stored';
}
export type CheckReply = { id: number; ok: true; json: string } | { id: number; ok: false; lines: string[] };
export type Checked = { ok: true; project: Project } | { ok: false; lines: string[] };

/** Texts longer than this are checked in a worker; a short one is checked at once on the page. */
export const OFF_THREAD_FROM = 200_000;

let worker: Worker | null = null;
let next = 0;
const waiting = new Map<number, (r: CheckReply | null) => void>();

function checker(): Worker | null {
  if (worker) return worker;
  if (typeof Worker === 'undefined') return null;
  try {
    worker = new Worker(new URL('./projectCheck.worker.ts', import.meta.url), { type: 'module' });
  } catch {
    return null;
  }
  worker.onmessage = (e: MessageEvent<CheckReply>) => {
    waiting.get(e.data.id)?.(e.data);
    waiting.delete(e.data.id);
  };
  worker.onerror = () => {
    // a worker that cannot start (blocked, out of memory): every waiting text is checked on the page
    for (const done of waiting.values()) done(null);
    waiting.clear();
    worker?.terminate();
    worker = null;
  };
  return worker;
}

/** A file's text the check by hand passes, or null: the schema then decides and words the refusal. */
function quickText(text: string): Project | null {
  try {
    return quickParse(JSON.parse(text));
  } catch {
    return null;
  }
}

async function onPage(text: string, words: CheckRequest['words']): Promise<Checked> {
  if (words === 'stored') return projectFromText(text);
  const quick = quickText(text);
  if (quick) return { ok: true, project: quick };
  const r = (await loadChecks()).parseProjectText(text);
  return r.ok ? r : { ok: false, lines: r.problems.map(problemText) };
}

/**
 * The whole-file check of a project text (a file being opened, a stored copy being restored), with
 * the same result and words on or off the main thread. A long text goes to a worker, so opening a
 * 10,000-node route leaves the page responsive; where no worker starts, the page checks it itself.
 */
export async function checkProjectText(text: string, words: CheckRequest['words']): Promise<Checked> {
  const w = text.length >= OFF_THREAD_FROM ? checker() : null;
  if (!w) return onPage(text, words);
  const id = ++next;
  const reply = await new Promise<CheckReply | null>((resolve) => {
    waiting.set(id, resolve);
    w.postMessage({ id, text, words } satisfies CheckRequest);
  });
  if (!reply) return onPage(text, words);
  return reply.ok ? { ok: true, project: JSON.parse(reply.json) as Project } : reply;
}
