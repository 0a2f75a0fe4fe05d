/**
 * The project file's JSON Schema, generated from the zod validator with zod 4's toJSONSchema.
 *
 * @example
 *   const text = projectJsonSchemaText(); // the contents of docs/project.schema.json
 */
import * as z from 'zod';
import { documentSchema } from './schema.ts';

export const SCHEMA_ID = 'https://dropline.invalid/project.schema.json';

export function projectJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(documentSchema, { target: 'draft-2020-12', unrepresentable: 'any' });
  return { $id: SCHEMA_ID, ...schema };
}

export function projectJsonSchemaText(): string {
  return `${JSON.stringify(projectJsonSchema(), null, 2)}\n`;
}
