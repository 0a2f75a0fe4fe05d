/**
 * Writes docs/project.schema.json from the zod validator (`npm run schema`). A unit test checks
 * the committed file equals what this produces, so the published schema never drifts.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { projectJsonSchemaText } from '../src/model/jsonSchema.ts';

const target = fileURLToPath(new URL('../docs/project.schema.json', import.meta.url));
writeFileSync(target, projectJsonSchemaText());
console.log(`wrote ${target}`);
