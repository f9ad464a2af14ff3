import { wordingContext, type Diagnostic } from '@mainbrace/solver';
import { useAnalysis, useApp } from '../state/StoreContext.js';
import { loadedWording } from '../state/scheduleViewOf.js';

/** Words a diagnostic of the current analysis in the chosen display units. */
export function useDiagnosticWords(): (d: Diagnostic) => string {
  const analysis = useAnalysis();
  const units = useApp((s) => s.units);
  const context = wordingContext(analysis, units);
  const { text } = loadedWording();
  return (d) => text(d, context);
}
