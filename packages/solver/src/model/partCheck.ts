import type { z } from 'zod';
import { projectShape, designSchema, loadCaseSchema, nodeSchema, pipeSchema, soilSchema } from './projectSchema.js';
import type { Project } from './projectSchema.js';
import { crossCheck } from './crossChecks.js';
import { pathText, type Problem } from './problems.js';
import { plainErrors, problemsFromIssues } from './schemaProblems.js';
import { tinyNumberProblems } from './tinyNumbers.js';

/** The list items of a project, each with its own schema. */
const ITEMS = { nodes: nodeSchema, pipes: pipeSchema, loadCases: loadCaseSchema, soils: soilSchema } as const;
export type ProjectList = keyof typeof ITEMS;

function under(head: string, tail: string): string {
  if (!tail || tail === '(whole file)') return head;
  return tail.startsWith('[') ? head + tail : `${head}.${tail}`;
}
const prefixed = (problems: Problem[], path: (string | number)[]) =>
  problems.map((p) => ({ ...p, path: under(pathText(path), p.path) }));

/**
 * The problems of one part of a project checked on its own, with the same words as the whole file's
 * check: a top-level field (`name`, `design`) or one item of a list (`nodes[4]`). An editor that
 * changes one part need not check the rest (docs/performance.md: validate only what an edit changed).
 */
export function partProblems(key: string, value: unknown, index?: number): Problem[] {
  const schema: z.ZodType | undefined =
    index !== undefined
      ? (ITEMS as Record<string, z.ZodType>)[key]
      : key === 'design'
        ? designSchema
        : (projectShape.shape as Record<string, z.ZodType>)[key];
  const path = index !== undefined ? [key, index] : [key];
  if (!schema) return [{ path: pathText(path), message: 'unknown field (not part of the project format)' }];
  const r = schema.safeParse(value, { error: plainErrors });
  if (!r.success) return prefixed(problemsFromIssues(r.error.issues), path);
  return prefixed(tinyNumberProblems(value), path);
}

/** The checks that span several parts (unique ids, references, coincident nodes, overlapping pipes). */
export function crossProblems(project: Project): Problem[] {
  const out: Problem[] = [];
  crossCheck(project, {
    addIssue: (issue: { path?: PropertyKey[]; message?: string }) =>
      out.push({ path: pathText(issue.path ?? []), message: issue.message ?? '' }),
  } as unknown as Parameters<typeof crossCheck>[1]);
  return out;
}
