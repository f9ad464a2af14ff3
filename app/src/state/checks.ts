import { quickParse, type Project } from '@mainbrace/solver';
import { importOrReload } from '../chrome/loadChunk.js';

type Checks = typeof import('./schemaChecks.js');
export type Validated = { ok: true; project: Project } | { ok: false; lines: string[] };

let loaded: Checks | null = null;
let loading: Promise<Checks> | null = null;

/**
 * Starts loading the schema checks (zod, once). They are not needed to open a valid project: the app
 * loads them after the first screen is drawn, to word a refusal, or for an edit that the check by
 * hand cannot pass (docs/performance.md: zod was 27 kB gzipped fetched before the demo was drawn).
 */
export function loadChecks(): Promise<Checks> {
  loading ??= importOrReload(() => import('./schemaChecks.js')).then(
    (m) => (loaded = m),
    (e: unknown) => {
      loading = null; // a later call tries again
      throw e;
    },
  );
  return loading;
}

/** Whether the schema checks are here, so that `checks()` answers at once. */
export const checksReady = (): boolean => loaded !== null;

/** The schema checks; only after `loadChecks` has finished (see `checksReady`). */
export function checks(): Checks {
  if (!loaded) throw new Error('The project checks are not loaded yet (loadChecks).');
  return loaded;
}

/**
 * A decoded project file checked before it replaces the current document (open, restore, the demo).
 * A value the check by hand passes (model/quickParse.ts: the schema's rules as plain loops, held to
 * the schema's answers and output by the solver's tests) opens without the schema library; anything
 * else goes to the schema, which words the refusal.
 */
export async function validated(data: unknown): Promise<Validated> {
  const quick = quickParse(data);
  if (quick) return { ok: true, project: quick };
  const r = (await loadChecks()).parseProject(data);
  return r.ok
    ? { ok: true, project: r.project }
    : { ok: false, lines: r.problems.map((p) => (p.path ? `${p.path}: ${p.message}` : p.message)) };
}
