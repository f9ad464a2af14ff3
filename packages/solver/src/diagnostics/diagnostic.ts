import { DIAGNOSTIC_CODES, type DiagnosticCode, type Severity } from './codes.js';

export type { DiagnosticCode, Severity } from './codes.js';

/** What a diagnostic is about: ids inside the project (a leg is a node and one of its pipes). */
export interface Subject {
  node?: string;
  pipe?: string;
  case?: string;
  soil?: string;
  /** path of a project-file field, e.g. "loadCases[1].pressure" */
  field?: string;
}

/**
 * A finding of the solver as data: a stable code, its severity, what it is about and the numbers that
 * explain it, in SI (the kind of each value is given by the code's entry in DIAGNOSTIC_CODES). The words
 * are made at the edge, in the reader's units, by `diagnosticText`.
 */
export interface Diagnostic {
  code: DiagnosticCode;
  severity: Severity;
  subject: Subject;
  values: Readonly<Record<string, number>>;
}

/** A diagnostic with the severity its code carries. */
export function diagnostic(code: DiagnosticCode, subject: Subject, values: Record<string, number> = {}): Diagnostic {
  return { code, severity: DIAGNOSTIC_CODES[code].severity, subject, values };
}

const RANK: Record<Severity, number> = { error: 0, warning: 1, info: 2 };

/** Most severe first, then by code: a stable order for every output. */
export const bySeverity = (a: Diagnostic, b: Diagnostic): number =>
  RANK[a.severity] - RANK[b.severity] || (a.code < b.code ? -1 : a.code > b.code ? 1 : 0);

/** Same code, subject and values: one finding, however many paths reported it. */
export function sameDiagnostic(a: Diagnostic, b: Diagnostic): boolean {
  if (a.code !== b.code) return false;
  const keys = (o: object) => Object.keys(o).sort().join('\u0000');
  const sa = a.subject as Record<string, string | undefined>;
  const sb = b.subject as Record<string, string | undefined>;
  const va = a.values;
  const vb = b.values;
  return (
    keys(sa) === keys(sb) &&
    Object.keys(sa).every((k) => sa[k] === sb[k]) &&
    keys(va) === keys(vb) &&
    Object.keys(va).every((k) => va[k] === vb[k])
  );
}

/** The list without repeats, in `bySeverity` order. */
export function uniqueDiagnostics(list: readonly Diagnostic[]): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const d of list) if (!out.some((o) => sameDiagnostic(o, d))) out.push(d);
  return out.sort(bySeverity);
}

export const worstSeverity = (list: readonly Diagnostic[]): Severity | null =>
  list.some((d) => d.severity === 'error')
    ? 'error'
    : list.some((d) => d.severity === 'warning')
      ? 'warning'
      : list.length
        ? 'info'
        : null;
