import type { DiagnosticCode, Severity } from '../diagnostics/codes.js';
import type { CodeMeanings } from '../diagnostics/codeMeanings.js';
import { bySeverity, type Diagnostic } from '../diagnostics/diagnostic.js';

/** One numbered note of a schedule: a finding printed once, with the marks it applies to. */
export interface ScheduleNote {
  number: number;
  code: DiagnosticCode;
  severity: Severity;
  text: string;
  marks: string[];
}

/**
 * A note's text after a heading that already says "NOT ADEQUATE" (the terminal table, the print):
 * the sentence's own leading "Not adequate:" is dropped so that the words are not said twice.
 */
export const noteAfterHeading = (n: Pick<ScheduleNote, 'severity' | 'text'>): string =>
  n.severity === 'error' ? n.text.replace(/^Not adequate:\s*(.)/, (_, c: string) => c.toUpperCase()) : n.text;

/**
 * Each distinct finding once (crew-sheet.md: notes, not repeats): diagnostics grouped by code, most
 * severe first. Where every fitting's finding of a code reads alike the note is that sentence; where
 * the numbers differ it is the code's meaning and action, and the calculation record keeps the numbers.
 */
export function scheduleNotes(
  rows: readonly { mark: string; diagnostics: readonly Diagnostic[] }[],
  words: (d: Diagnostic) => string,
  meanings: CodeMeanings,
  names?: { pipe: (id: string) => string; caseName: (id: string) => string },
): { notes: ScheduleNote[]; byMark: Map<string, number[]> } {
  // `seen` keeps the marks' membership test constant-time: a finding shared by 10,000 fittings made
  // the list search quadratic (docs/performance.md, a 10,000-node route).
  // A finding about the route as a whole (no mark: a pipe over its rating, an input out of range) is
  // its own note, worded with what it names, rather than merged into its code's general meaning.
  // A finding on a pipe (over its rating) is one note per code and case, naming the pipes: a line of
  // pipes over their class would otherwise print the same sentence once per pipe.
  type Group = {
    texts: Set<string>;
    marks: string[];
    seen: Set<string>;
    first: Diagnostic;
    /** the pipes of a pipe finding, and its sentence worded with no pipe named */
    pipes?: string[];
    bare?: Set<string>;
  };
  const groups = new Map<string, Group>();
  for (const r of rows) {
    for (const d of r.diagnostics) {
      const text = words(d);
      const onPipe = !r.mark && names && d.subject.pipe !== undefined;
      const key = r.mark
        ? d.code
        : onPipe
          ? `${d.code}\u0000pipes\u0000${d.subject.case ?? ''}`
          : `${d.code}\u0000${text}`;
      let g = groups.get(key);
      if (!g) groups.set(key, (g = { texts: new Set(), marks: [], seen: new Set(), first: d }));
      g.texts.add(text);
      if (onPipe) {
        (g.pipes ??= []).push(d.subject.pipe!);
        (g.bare ??= new Set()).add(words({ ...d, subject: { ...d.subject, pipe: undefined } }));
      }
      if (r.mark && !g.seen.has(r.mark)) {
        g.seen.add(r.mark);
        g.marks.push(r.mark);
      }
    }
  }
  const ordered = [...groups.values()].sort((a, b) => bySeverity(a.first, b.first));
  const notes: ScheduleNote[] = ordered.map((g, i) => {
    const spec = meanings[g.first.code];
    let text = g.texts.size === 1 ? [...g.texts][0]! : `${spec.meaning} ${spec.action}`;
    if (g.pipes && g.pipes.length > 1 && names) {
      const list = g.pipes.map((id) => names.pipe(id).replace(/^the pipe /, '')).join('; ');
      const inCase = g.first.subject.case ? `Case “${names.caseName(g.first.subject.case)}”: ` : '';
      text =
        g.bare!.size === 1
          ? `${[...g.bare!][0]!} (${g.pipes.length} pipes: ${list})`
          : `${spec.meaning} ${spec.action} ${inCase}${g.pipes.length} pipes: ${list}.`;
    }
    return { number: i + 1, code: g.first.code, severity: g.first.severity, text, marks: g.marks };
  });
  const byMark = new Map<string, number[]>();
  for (const n of notes) for (const m of n.marks) byMark.set(m, [...(byMark.get(m) ?? []), n.number]);
  return { notes, byMark };
}
