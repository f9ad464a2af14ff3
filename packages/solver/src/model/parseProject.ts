import { projectSchema } from './project.js';
import type { Project } from './projectSchema.js';
import type { Problem } from './problems.js';
import { plainErrors, problemsFromIssues } from './schemaProblems.js';
import { tinyNumberProblems } from './tinyNumbers.js';

export type ParseResult = { ok: true; project: Project } | { ok: false; problems: Problem[] };

/** Validates a decoded JSON value as a project file; never throws. */
export function parseProject(data: unknown): ParseResult {
  const result = projectSchema.safeParse(data, { error: plainErrors });
  if (result.success) {
    const tiny = tinyNumberProblems(result.data);
    return tiny.length ? { ok: false, problems: tiny } : { ok: true, project: result.data };
  }
  return { ok: false, problems: problemsFromIssues(result.error.issues) };
}

/** Line and column (1-based) of a character offset in a text. */
function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}

/** Where JSON.parse stopped, from its message (V8 gives "at position N" or "line L column C"). */
function jsonErrorProblem(text: string, error: Error): Problem {
  const lc = /line (\d+) column (\d+)/.exec(error.message);
  const pos = /position (\d+)/.exec(error.message);
  let where = '';
  if (lc) where = `line ${lc[1]}, column ${lc[2]}`;
  else if (pos) {
    const { line, column } = lineColumn(text, Number(pos[1]));
    where = `line ${line}, column ${column}`;
  } else if (/Unexpected end/.test(error.message)) {
    const { line, column } = lineColumn(text, text.length);
    where = `line ${line}, column ${column} (end of file)`;
  }
  const reason = error.message.replace(/\s*\(line \d+ column \d+\)/, '').replace(/ in JSON at position \d+.*$/, '');
  return { path: '', message: `not valid JSON${where ? ` at ${where}` : ''}: ${reason}` };
}

/** Parses the text of a project file: JSON syntax first, then the schema. Never throws. */
export function parseProjectText(text: string): ParseResult {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, problems: [jsonErrorProblem(text, e as Error)] };
  }
  return parseProject(data);
}
