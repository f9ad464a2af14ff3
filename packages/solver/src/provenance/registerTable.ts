import type { ProvenanceEntry } from './entry.js';
import { REGISTER } from './register.js';

const cell = (t: string) => t.replace(/\|/g, '\\|');

function valueText(v: ProvenanceEntry['value']): string {
  if (v === null) return 'formula';
  if (typeof v === 'number') return String(v);
  if (Array.isArray(v)) return v.join(', ');
  return Object.entries(v)
    .map(([k, x]) => `${k}: ${x}`)
    .join('; ');
}

/** docs/provenance.md: the register of every coefficient, table, formula and default the solver uses. */
export function provenanceMarkdown(): string {
  const rows = (Object.entries(REGISTER) as [string, ProvenanceEntry][]).map(
    ([id, e]) =>
      `| \`${id}\` | ${cell(e.quantity)} | ${cell(valueText(e.value))} | ${cell(e.unit)} | ${e.kind} | ${cell(e.source)}${e.clause ? `, ${cell(e.clause)}` : ''}${e.note ? ` (${cell(e.note)})` : ''} | ${e.verified ? 'yes' : '**no**'} |`,
  );
  const open = Object.values(REGISTER).filter((e) => !e.verified).length;
  return [
    '# Provenance register',
    '',
    'Every coefficient, table, formula and default the solver relies on, with where it comes from. The code reads',
    'its values from `packages/solver/src/provenance/register.ts` (through `registerValues.ts`, generated from it),',
    'and every result lists the entries it depends on that were not read in their source: the calculation record,',
    '`explain` and the print say “not verified against <document, clause>” beside them.',
    '',
    '*verified* means the value was read in the document itself, or in a faithful reproduction of its table named',
    'in the source. *common practice* is a rule of thumb of the trade; *own rule* a choice of this project;',
    '*derived* worked out from statics and other entries.',
    '',
    `${open} of ${Object.keys(REGISTER).length} entries are not yet verified.`,
    '',
    'This page is generated from the register; a test keeps it current (`UPDATE_DOCS=1 corepack pnpm test`).',
    '',
    '| id | quantity | value | unit | kind | source | verified |',
    '|---|---|---|---|---|---|---|',
    ...rows,
    '',
  ].join('\n');
}

/**
 * provenance/registerValues.ts: the register's values and which entries are unverified, without their
 * words, for the code that computes with them (the words load only where they are shown).
 */
export function registerValuesModule(): string {
  const values = (Object.entries(REGISTER) as [string, ProvenanceEntry][]).map(
    ([id, e]) => `  '${id}': ${JSON.stringify(e.value)},`,
  );
  const open = (Object.entries(REGISTER) as [string, ProvenanceEntry][]).filter(([, e]) => !e.verified);
  return [
    '// Generated from register.ts by provenance/generatedDocs.test.ts (`UPDATE_DOCS=1 corepack pnpm test`): edit',
    '// the register, never this file. The values the solver computes with, apart from the register’s words,',
    '// so that code which only computes does not load the words (docs/performance.md).',
    "import type { ProvenanceId, REGISTER } from './register.js';",
    '',
    '/** Each register entry’s value, by id. */',
    "export const VALUES: { readonly [K in ProvenanceId]: (typeof REGISTER)[K]['value'] } = {",
    ...values,
    '};',
    '',
    '/** The entries not read in their source, in register order. */',
    'export const UNVERIFIED: readonly ProvenanceId[] = [',
    ...open.map(([id]) => `  '${id}',`),
    '];',
    '',
  ].join('\n');
}
