import { describe, expect, it } from 'vitest';
import { parseProjectText, problemText } from '@mainbrace/solver';
import { checkProjectText, OFF_THREAD_FROM } from './projectCheck.js';
import { projectFromText } from './restore.js';
import { project } from '../testFixtures.js';

/** A valid project text padded past the worker threshold with a long (allowed) label. */
function longText(): string {
  const p = project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 40, y: 0 },
    ],
    [{ from: 'n1', to: 'n2' }],
  );
  const text = JSON.stringify(p, null, 2);
  return text + ' '.repeat(Math.max(0, OFF_THREAD_FROM - text.length + 10));
}

describe('checking a project text on or off the page', () => {
  it('gives the whole-file check’s document for a long valid text', async () => {
    const text = longText();
    const r = await checkProjectText(text, 'file');
    const reference = parseProjectText(text);
    expect(r.ok && reference.ok && r.project).toEqual(reference.ok && reference.project);
  });

  it('refuses a damaged file and a damaged stored copy with the same words as before', async () => {
    const broken = longText().replace('"nodes"', '"nodes" 1');
    const file = await checkProjectText(broken, 'file');
    const reference = parseProjectText(broken);
    expect(file).toEqual({ ok: false, lines: reference.ok ? [] : reference.problems.map(problemText) });
    expect(await checkProjectText(broken, 'stored')).toEqual(await projectFromText(broken));
  });
});
