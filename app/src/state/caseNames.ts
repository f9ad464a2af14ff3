import type { LoadCase } from '@mainbrace/solver';

/** What a case picker shows of a load case: not its pressure. */
export interface CaseName {
  id: string;
  label: string | undefined;
  kind: LoadCase['kind'];
}

let lastCases: readonly LoadCase[] | null = null;
let lastNames: readonly CaseName[] = [];

const sameNames = (a: readonly CaseName[], b: readonly CaseName[]) =>
  a.length === b.length && a.every((x, i) => x.id === b[i]!.id && x.label === b[i]!.label && x.kind === b[i]!.kind);

/**
 * The cases' ids, labels and kinds, as the same array for as long as none of them changes: a pressure
 * edit (every step of the test-pressure slider) replaces the document's case list, and the pickers
 * that show only the names must not render again for it. A store selector (stable result).
 */
export function caseNames(cases: readonly LoadCase[]): readonly CaseName[] {
  if (cases === lastCases) return lastNames;
  const next = cases.map((c) => ({ id: c.id, label: c.label, kind: c.kind }));
  if (!sameNames(next, lastNames)) lastNames = next;
  lastCases = cases;
  return lastNames;
}
