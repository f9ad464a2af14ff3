import { z } from 'zod';
import { projectShape } from './projectSchema.js';

/** JSON Schema (draft 2020-12) of the project file as a person writes it (defaults optional). */
export function projectJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(projectShape, { io: 'input', target: 'draft-2020-12' }) as Record<string, unknown>;
  return {
    ...schema,
    $id: 'mainbrace-project.schema.json',
    title: 'Mainbrace project file, version 1',
    description:
      'A buried pressure water main: nodes, pipes, soils and load cases. SI base units (m, Pa, m³/s, kg/m³, N/m³); angles in degrees.',
  };
}
