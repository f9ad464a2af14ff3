import { describe, it, expect } from 'vitest';
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { diagnosticsMarkdown } from '../diagnostics/codeTable.js';
import { provenanceMarkdown, registerValuesModule } from './registerTable.js';
import { REGISTER, type ProvenanceId } from './register.js';
import { UNVERIFIED, VALUES } from './registerValues.js';
import { limitsMarkdown } from '../model/limitsTable.js';

const docs = (name: string) => fileURLToPath(new URL(`../../../../docs/${name}`, import.meta.url));

/** A generated page matches its source; UPDATE_DOCS=1 rewrites it instead. */
function current(name: string, text: string) {
  if (process.env.UPDATE_DOCS) writeFileSync(docs(name), text);
  expect(readFileSync(docs(name), 'utf8')).toBe(text);
}

describe('the generated reference pages in docs/', () => {
  it('docs/diagnostics.md lists every diagnostic code with its meaning and what to do', () => {
    current('diagnostics.md', diagnosticsMarkdown());
  });

  it('docs/limits.md lists every plausibility range with its hard and usual bounds', () => {
    current('limits.md', limitsMarkdown());
  });

  it('docs/provenance.md lists every register entry with its source and whether it was verified', () => {
    current('provenance.md', provenanceMarkdown());
  });

  it('provenance/registerValues.ts holds every register entry’s value and the unverified ones, as the register', () => {
    const file = fileURLToPath(new URL('./registerValues.ts', import.meta.url));
    if (process.env.UPDATE_DOCS) writeFileSync(file, registerValuesModule());
    expect(readFileSync(file, 'utf8')).toBe(registerValuesModule());
    // and the values as the code reads them are the register's, each (a text can hide what JSON cannot write)
    for (const id of Object.keys(REGISTER) as ProvenanceId[]) expect(VALUES[id]).toEqual(REGISTER[id].value);
    expect(UNVERIFIED).toEqual((Object.keys(REGISTER) as ProvenanceId[]).filter((id) => !REGISTER[id].verified));
  });
});
