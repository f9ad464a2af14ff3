// The edits of the route's shape and what they say, in a chunk the app loads after the first screen (state/routeEdits.ts).
export { addRoute, deleteItems, moveNodes } from './documentEdits.js';
export { setPlanLength } from './legLength.js';
export { deletedNotice, separateRunNotice } from './routeEditNotices.js';
