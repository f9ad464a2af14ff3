import type { z } from 'zod';
import { pathText, type Problem } from './problems.js';

// The schema's refusals in plain words: read only with the schema (zod), which loads after the first
// screen (docs/performance.md), apart from the problem type and paths the check by hand also uses (problems.ts).

function describe(value: unknown): string {
  if (value === undefined) return 'nothing (the field is missing)';
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'number' && !Number.isFinite(value)) return String(value);
  if (typeof value === 'string')
    return `the text ${JSON.stringify(value.length > 30 ? value.slice(0, 30) + '…' : value)}`;
  return typeof value === 'object' ? 'an object' : `a ${typeof value}`;
}

const expectedWords: Record<string, string> = {
  number: 'a number',
  string: 'text',
  boolean: 'true or false',
  object: 'an object',
  array: 'a list',
};

/** zod error map: every message says what was expected, in plain words. */
export const plainErrors: z.core.$ZodErrorMap = (issue) => {
  switch (issue.code) {
    case 'invalid_type': {
      const expected = expectedWords[issue.expected] ?? issue.expected;
      return `expected ${expected}, got ${describe(issue.input)}`;
    }
    case 'invalid_value':
      return `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}; got ${describe(issue.input)}`;
    case 'too_big':
      // text and lists: a length (numbers carry their own wording from the limits table)
      if (issue.origin === 'string' && typeof issue.input === 'string')
        return `must be at most ${issue.maximum} characters long; got ${issue.input.length}`;
      if (issue.origin === 'array' && Array.isArray(issue.input))
        return `must hold at most ${issue.maximum} items; got ${issue.input.length}`;
      return undefined;
    case 'unrecognized_keys':
      return `unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.map((k) => `"${k}"`).join(', ')} (not part of the project format)`;
    default:
      return undefined;
  }
};

/** zod issues → problems; unknown keys become one problem per field so each path is exact. */
export function problemsFromIssues(issues: readonly z.core.$ZodIssue[]): Problem[] {
  const out: Problem[] = [];
  for (const issue of issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) {
        out.push({ path: pathText([...issue.path, key]), message: 'unknown field (not part of the project format)' });
      }
    } else {
      out.push({ path: pathText(issue.path) || '(whole file)', message: issue.message });
    }
  }
  return out;
}
