import 'vitest-canvas-mock';
import { loadChecks } from './state/checks.js';
import { loadRouteEdits } from './state/routeEdits.js';
import { loadCommands } from './chrome/appCommands.js';
import { NoticeCard } from './chrome/NoticeBar.js';

// The app loads its schema checks, the route's edits, its commands and the notice card after its first
// screen; the tests before they start.
await loadChecks();
await loadRouteEdits();
await loadCommands();
await NoticeCard.preload();
