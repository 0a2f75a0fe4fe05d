import { readFileSync } from 'node:fs';
import { expect, test } from 'vitest';
import { projectJsonSchemaText } from '../../../src/model/jsonSchema.ts';

test('docs/project.schema.json is what `npm run schema` produces now', () => {
  const committed = readFileSync(new URL('../../../docs/project.schema.json', import.meta.url), 'utf8');
  expect(committed).toBe(projectJsonSchemaText());
});

test('the published schema is strict and requires the format id and version', () => {
  const schema = JSON.parse(projectJsonSchemaText());
  expect(schema.additionalProperties).toBe(false);
  expect(schema.properties.format.const).toBe('dropline-project');
  expect(schema.properties.version.const).toBe(2);
  expect(schema.required).toEqual([
    'format',
    'version',
    'details',
    'settings',
    'nodes',
    'cables',
    'alternatives',
  ]);
  expect(schema.properties.cables.items.properties.lengthM.minimum).toBe(0);
});
