import type { Analysis, FittingAnalysis } from '../analysis/analyse.js';
import { calculationRecord } from '../analysis/calculationRecord.js';
import type { RecordValue } from '../analysis/calcRecord.js';
import { formatSi } from '../units/format.js';
import type { UnitSystem } from '../units/conversions.js';
import { SHORT_CAUTION } from '../schedule/shortCaution.js';
import { fittingTitle } from '../schedule/fittingNames.js';
import { diagnosticText } from '../diagnostics/wording.js';
import { wordingContext } from '../diagnostics/context.js';
import { notVerifiedText } from '../provenance/entry.js';
import { REGISTER } from '../provenance/register.js';
import { unverified } from '../provenance/unverified.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { restraintElements } from '../schedule/restraintElements.js';
import { escapeControls } from './terminalText.js';

const shown = (v: RecordValue, units: UnitSystem) => formatSi(v.value, v.dimension, units, 4);

/**
 * A fitting's calculation record as plain text: each step's formula, inputs with sources, result.
 * Each line is escaped on its own, so a label cannot add lines or act on the terminal.
 */
export function explainText(a: Analysis, f: FittingAnalysis, units: UnitSystem): string {
  // What to build first, each element named by the fitting's mark; then how it was found.
  const row = scheduleOf(a).fittings.find((r) => r.node === f.node.id);
  const title = fittingTitle({ ...f.geometry, profile: row?.profile ?? null, diagnostics: f.diagnostics });
  const out = [`${f.mark} — ${title} (node ${f.node.id}, run ${f.run})`, ''];
  const elements = row ? restraintElements(row, units, a.project.design.dimensionStep) : [];
  const width = Math.max(0, ...elements.map((e) => e.name.length));
  out.push(
    'Restraint',
    ...(elements.length
      ? elements.map((e) => `  ${e.name.padEnd(width)}  ${e.text}${e.forceText ? `; ${e.forceText}` : ''}`)
      : ['  none']),
    '',
  );
  calculationRecord(a.project, f).forEach((step, i) => {
    out.push(`${i + 1}. ${step.title}`, `   ${step.formula}`);
    for (const v of step.inputs)
      out.push(`     ${v.symbol} = ${shown(v, units)}  ${v.label}${v.source ? ` [${v.source}]` : ''}`);
    out.push(
      `   → ${step.result.symbol} = ${shown(step.result, units)}  ${step.result.label}${step.result.source && step.result.source !== 'computed' ? ` (${step.result.source})` : ''}`,
    );
    out.push(`   Source: ${step.reference}`, '');
  });
  if (f.diagnostics.length) {
    const context = wordingContext(a, units);
    out.push(
      'Findings',
      ...f.diagnostics.map((d) => `  - [${d.severity}] ${diagnosticText(d, context)} (${d.code})`),
      '',
    );
  }
  const open = unverified(f.basis);
  if (open.length) {
    out.push(
      'Relies on values not yet verified',
      ...open.map((id) => `  - ${REGISTER[id].quantity}: ${notVerifiedText(REGISTER[id])}`),
      '',
    );
  }
  out.push(SHORT_CAUTION);
  return out.map(escapeControls).join('\n') + '\n';
}
