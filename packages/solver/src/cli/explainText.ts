import { calculationRecord, type FittingAnalysis } from '../analysis/analyse.js';
import type { RecordValue } from '../analysis/calcRecord.js';
import { formatSi } from '../units/format.js';
import type { UnitSystem } from '../units/conversions.js';
import { SHORT_CAUTION } from '../schedule/cautions.js';
import type { Project } from '../model/projectSchema.js';
import { escapeControls } from './terminalText.js';

const shown = (v: RecordValue, units: UnitSystem) => formatSi(v.value, v.dimension, units, 4);

/**
 * A fitting's calculation record as plain text: each step's formula, inputs with sources, result.
 * Each line is escaped on its own, so a label cannot add lines or act on the terminal.
 */
export function explainText(project: Project, f: FittingAnalysis, units: UnitSystem): string {
  const out = [`${f.tag} (node ${f.node.id}) — ${f.geometry.kind}`, ''];
  calculationRecord(project, f).forEach((step, i) => {
    out.push(`${i + 1}. ${step.title}`, `   ${step.formula}`);
    for (const v of step.inputs)
      out.push(`     ${v.symbol} = ${shown(v, units)}  ${v.label}${v.source ? ` [${v.source}]` : ''}`);
    out.push(
      `   → ${step.result.symbol} = ${shown(step.result, units)}  ${step.result.label}${step.result.source && step.result.source !== 'computed' ? ` (${step.result.source})` : ''}`,
    );
    out.push(`   Source: ${step.reference}`, '');
  });
  if (f.warnings.length) out.push('Warnings', ...f.warnings.map((w) => `  - ${w}`), '');
  out.push(SHORT_CAUTION);
  return out.map(escapeControls).join('\n') + '\n';
}
