// Everything the app needs of the project schema (zod), in a chunk of its own: it loads beside the
// first screen instead of before it (docs/performance.md: zod was 23 kB of the first-load JavaScript).
export { parseProject, parseProjectText, partProblems, crossProblems } from '@mainbrace/solver';
// An edit's own check reads the schema's parts, so it comes with them.
export { editProblemList } from './editCheck.js';
// A refusal is worded only where the check found one: its words come with the check.
export { refusalLine } from './refusalWords.js';
