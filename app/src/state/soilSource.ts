import type { Soil } from '@mainbrace/solver';

/** The values a soil's source vouches for. */
const SOURCED: readonly (keyof Soil)[] = [
  'bearing',
  'bearingPerDepth',
  'unitWeight',
  'frictionAngle',
  'cohesion',
  'minCover',
];

export const EDITED_SOURCE = 'Edited by the user: state the source of these values';

/** The project file's limit on a source's length (projectSchema.ts). */
const SOURCE_MAX = 400;

/**
 * A soil edit with its source kept honest: once a value the source vouched for changes, the source no
 * longer describes it (a library row's 2,000 lb/ft² is not the site's 75 kPa), so it says the values were
 * edited and keeps the old text after "was:". A source the user writes themselves is kept as written.
 */
export function withSourceKept(soil: Soil, patch: Partial<Soil>): Partial<Soil> {
  if ('source' in patch || soil.source === undefined || soil.source.startsWith(EDITED_SOURCE)) return patch;
  const changed = SOURCED.some((k) => k in patch && patch[k] !== soil[k]);
  if (!changed) return patch;
  const source = `${EDITED_SOURCE} (was: ${soil.source})`;
  return { ...patch, source: source.length > SOURCE_MAX ? `${source.slice(0, SOURCE_MAX - 2)}…)` : source };
}
