// The edits of the route's shape, in a chunk the app loads after the first screen (state/routeEdits.ts).
export { addRoute, deleteItems, moveNodes } from './documentEdits.js';
export { setPlanLength } from './legLength.js';
