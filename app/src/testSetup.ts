import 'vitest-canvas-mock';
import { loadChecks } from './state/checks.js';

// The app loads its schema checks before it opens a document; so do the tests.
await loadChecks();
