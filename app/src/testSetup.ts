import 'vitest-canvas-mock';
import { loadChecks } from './state/checks.js';
import { loadRouteEdits } from './state/routeEdits.js';

// The app loads its schema checks and the route's edits after its first screen; the tests before they start.
await loadChecks();
await loadRouteEdits();
