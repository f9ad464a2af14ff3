// The details of a selected node, pipe or fitting: one lazy chunk, off the first screen (which shows
// the route summary).
export { FittingResults } from './FittingResults.js';
export { NodeDetails } from './NodeDetails.js';
export { PipeDetails } from './PipeDetails.js';
