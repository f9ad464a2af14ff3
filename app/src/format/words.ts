import { diagnosticText, wordingContext, type Diagnostic } from '@mainbrace/solver';
import { useAnalysis, useApp } from '../state/StoreContext.js';

/** Words a diagnostic of the current analysis in the chosen display units. */
export function useDiagnosticWords(): (d: Diagnostic) => string {
  const analysis = useAnalysis();
  const units = useApp((s) => s.units);
  const context = wordingContext(analysis, units);
  return (d) => diagnosticText(d, context);
}
