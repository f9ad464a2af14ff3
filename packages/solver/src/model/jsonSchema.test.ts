import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { projectJsonSchema } from './jsonSchema.js';

const committed = fileURLToPath(new URL('../../schema/project.schema.json', import.meta.url));

describe('the committed JSON Schema', () => {
  it('is what the zod schema generates now (regenerate with `pnpm --filter @mainbrace/solver schema`)', () => {
    expect(JSON.parse(readFileSync(committed, 'utf8'))).toEqual(projectJsonSchema());
  });
});
