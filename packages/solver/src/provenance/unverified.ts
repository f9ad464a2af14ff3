import type { ProvenanceId } from './register.js';
import { UNVERIFIED } from './registerValues.js';

const unverifiedOf = new Map<string, ProvenanceId[]>();

/** The entries among `ids` that were not read in their source, in register order. */
export function unverified(ids: Iterable<ProvenanceId>): ProvenanceId[] {
  const list = [...ids];
  if (list.length === 0) return [];
  // A schedule asks this for every fitting, and fittings share a handful of bases: remember each.
  const key = list.join('\u0000');
  let found = unverifiedOf.get(key);
  if (!found) {
    const wanted = new Set(list);
    found = UNVERIFIED.filter((id) => wanted.has(id));
    unverifiedOf.set(key, found);
  }
  return found.slice();
}
