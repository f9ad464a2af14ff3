import { DIAGNOSTIC_CODES, type DiagnosticCode, type Severity } from '../diagnostics/codes.js';
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
 * Each distinct finding once (crew-sheet.md: notes, not repeats): diagnostics grouped by code, most
 * severe first. Where every fitting's finding of a code reads alike the note is that sentence; where
 * the numbers differ it is the code's meaning and action, and the calculation record keeps the numbers.
 */
export function scheduleNotes(
  rows: readonly { mark: string; diagnostics: readonly Diagnostic[] }[],
  words: (d: Diagnostic) => string,
): { notes: ScheduleNote[]; byMark: Map<string, number[]> } {
  // `seen` keeps the marks' membership test constant-time: a finding shared by 10,000 fittings made
  // the list search quadratic (issue 16, a 10,000-node route).
  const groups = new Map<
    DiagnosticCode,
    { texts: Set<string>; marks: string[]; seen: Set<string>; first: Diagnostic }
  >();
  for (const r of rows) {
    for (const d of r.diagnostics) {
      let g = groups.get(d.code);
      if (!g) groups.set(d.code, (g = { texts: new Set(), marks: [], seen: new Set(), first: d }));
      g.texts.add(words(d));
      if (r.mark && !g.seen.has(r.mark)) {
        g.seen.add(r.mark);
        g.marks.push(r.mark);
      }
    }
  }
  const ordered = [...groups.values()].sort((a, b) => bySeverity(a.first, b.first));
  const notes: ScheduleNote[] = ordered.map((g, i) => {
    const spec = DIAGNOSTIC_CODES[g.first.code];
    const text = g.texts.size === 1 ? [...g.texts][0]! : `${spec.meaning} ${spec.action}`;
    return { number: i + 1, code: g.first.code, severity: g.first.severity, text, marks: g.marks };
  });
  const byMark = new Map<string, number[]>();
  for (const n of notes) for (const m of n.marks) byMark.set(m, [...(byMark.get(m) ?? []), n.number]);
  return { notes, byMark };
}
