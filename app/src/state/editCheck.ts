import type { Problem, Project } from '@mainbrace/solver';
import { checks } from './checks.js';

const LISTS = ['nodes', 'pipes', 'loadCases', 'soils'] as const;
type List = (typeof LISTS)[number];
const isList = (k: string): k is List => (LISTS as readonly string[]).includes(k);

/** What the checks spanning several parts read of an item; an edit that keeps it needs no such check. */
function crossKey(list: List, item: Record<string, unknown>): string {
  switch (list) {
    case 'nodes':
      return `${String(item.id)}|${String(item.x)}|${String(item.y)}|${String(item.elevation)}|${String(item.soil)}`;
    case 'pipes':
      return `${String(item.id)}|${String(item.from)}|${String(item.to)}|${String(item.insideDiameter)}|${String(item.outsideDiameter)}`;
    default:
      return String(item.id);
  }
}

const LEAST_ONE: Partial<Record<List, string>> = {
  loadCases: 'must have at least one load case',
  soils: 'must have at least one soil',
};

/**
 * The problems an edit would bring into a document that was valid before it: only the parts the
 * edit replaced are checked against the schema (edits copy what they keep, so an unchanged part is
 * the same object), and the checks across parts run only when an id, a reference, a position or a
 * diameter changed. Same words as the whole-file check; a keystroke in one field of a 10,000-node
 * route checks that one field.
 */
export function editProblemList(before: Project, after: Project): Problem[] {
  const b = before as unknown as Record<string, unknown>;
  const a = after as unknown as Record<string, unknown>;
  const out: Problem[] = [];
  let cross = false;
  for (const key of new Set([...Object.keys(b), ...Object.keys(a)])) {
    if (b[key] === a[key]) continue;
    if (!isList(key) || !Array.isArray(a[key])) {
      out.push(...checks().partProblems(key, a[key]));
      if (key === 'defaultSoil') cross = true;
      continue;
    }
    const was = Array.isArray(b[key]) ? (b[key] as Record<string, unknown>[]) : [];
    const now = a[key] as Record<string, unknown>[];
    if (now.length !== was.length) cross = true;
    if (now.length === 0 && LEAST_ONE[key]) out.push({ path: key, message: LEAST_ONE[key] });
    for (let i = 0; i < now.length; i++) {
      const item = now[i]!;
      const old = was[i];
      if (item === old) continue;
      out.push(...checks().partProblems(key, item, i));
      if (!cross && (old === undefined || crossKey(key, old) !== crossKey(key, item))) cross = true;
    }
  }
  if (cross && out.length === 0) out.push(...checks().crossProblems(after));
  return out;
}
