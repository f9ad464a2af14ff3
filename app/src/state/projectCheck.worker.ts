// The whole-file check of a large project text, off the main thread: JSON.parse and the schema check
// of a 10,000-node route take over a second, a task that would freeze the page (docs/performance.md).
// Answers with the checked document as JSON text: a string crosses to the page far more cheaply than
// a structured clone of the object graph, and JSON.parse on the page is the browser's own fast path.
import { parseProject, parseProjectText, problemText, type ParseResult } from '@mainbrace/solver';
import type { CheckReply, CheckRequest } from './projectCheck.js';

function check(text: string, words: CheckRequest['words']): ParseResult | { ok: false; lines: string[] } {
  if (words === 'file') return parseProjectText(text);
  // a stored copy: the same words as `projectFromText` on the page
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (err) {
    return { ok: false, lines: [`not valid JSON: ${(err as Error).message}`] };
  }
  return parseProject(data);
}

self.onmessage = (e: MessageEvent<CheckRequest>) => {
  const { id, text, words } = e.data;
  const r = check(text, words);
  const reply: CheckReply = r.ok
    ? { id, ok: true, json: JSON.stringify(r.project) }
    : { id, ok: false, lines: 'lines' in r ? r.lines : r.problems.map(problemText) };
  self.postMessage(reply);
};
