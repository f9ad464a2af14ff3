import { wordingContext } from '@mainbrace/solver';
import { useAnalysis, useApp } from '../state/StoreContext.js';

/**
 * A node as the plan and the schedule name it: its mark (A2), else its label, else where it lies; the
 * same words the findings use (the solver's wording context), never its file id alone.
 */
export function useNodeName(): (id: string) => string {
  const analysis = useAnalysis();
  const units = useApp((s) => s.units);
  return wordingContext(analysis, units).nodeName;
}

/** "Node A2", "Node “Hydrant 4”", "Node at 120.0 m E, 35.0 m N". */
export const nodeTitle = (name: string): string => `Node ${name.replace(/^the point /, '')}`;
