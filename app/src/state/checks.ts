type Checks = typeof import('./schemaChecks.js');

let loaded: Checks | null = null;
let loading: Promise<Checks> | null = null;

/** Starts loading the schema checks (once); the app awaits it before it opens any document. */
export function loadChecks(): Promise<Checks> {
  loading ??= import('./schemaChecks.js').then((m) => (loaded = m));
  return loading;
}

/** The schema checks; loaded before the first document is opened, so every edit finds them. */
export function checks(): Checks {
  if (!loaded) throw new Error('The project checks are not loaded yet (loadChecks runs at start).');
  return loaded;
}
