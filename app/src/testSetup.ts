import 'vitest-canvas-mock';
import { loadChecks } from './state/checks.js';
import { loadRouteEdits } from './state/routeEdits.js';
import { loadCommands } from './chrome/appCommands.js';
import { NoticeCard } from './chrome/NoticeBar.js';
import { loadScheduleWords } from './state/scheduleViewOf.js';

// The app loads its schema checks, the route's edits, its commands and the notice card after its first
// screen, and the findings' meanings beside its first document; the tests before they start.
await loadScheduleWords();
await loadChecks();
await loadRouteEdits();
await loadCommands();
await NoticeCard.preload();
