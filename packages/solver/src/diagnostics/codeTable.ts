import { DIAGNOSTIC_CODES, type CodeSpec, type DiagnosticCode } from './codes.js';
import { CODE_MEANINGS } from './codeMeanings.js';

const SI_UNIT: Record<string, string> = {
  length: 'm',
  elevation: 'm',
  diameter: 'm',
  area: 'm²',
  volume: 'm³',
  force: 'N',
  pressure: 'Pa',
  stress: 'Pa',
  unitWeight: 'N/m³',
  flow: 'm³/s',
  density: 'kg/m³',
  angle: '°',
  velocity: 'm/s',
  forcePerLength: 'N/m',
  stressGradient: 'Pa/m',
  ratio: '—',
};

const cell = (t: string) => t.replace(/\|/g, '\\|');

/** docs/diagnostics.md: every code the solver can report, what it means and what to do. */
export function diagnosticsMarkdown(): string {
  const rows = (Object.entries(DIAGNOSTIC_CODES) as [DiagnosticCode, CodeSpec][]).map(([code, s]) => {
    const { meaning, action } = CODE_MEANINGS[code];
    const values = Object.entries(s.values)
      .map(([name, kind]) => `${name} (${SI_UNIT[kind] ?? kind})`)
      .join(', ');
    return `| \`${code}\` | ${s.severity} | ${cell(meaning)} | ${cell(action)} | ${values || '—'} |`;
  });
  return [
    '# Diagnostics',
    '',
    'Every finding the solver reports is data: a stable code, a severity, the subject (node, pipe, case, soil or',
    'field) and its values in SI. The words are made at the edge, in the reader’s units. In the JSON schedule each',
    'fitting carries `diagnostics` (codes, with each value’s kind) and `warnings` (the same findings worded in SI).',
    '',
    'Severities: **info** a fact worth knowing; **warning** check before building; **error** the restraint is not',
    'adequate as it stands (the schedule says so and what to do).',
    '',
    'This page is generated from `packages/solver/src/diagnostics/codes.ts` and `codeMeanings.ts`; a test keeps it current',
    '(`UPDATE_DOCS=1 corepack pnpm test` rewrites it).',
    '',
    '| code | severity | meaning | what to do | values (SI) |',
    '|---|---|---|---|---|',
    ...rows,
    '',
  ].join('\n');
}
