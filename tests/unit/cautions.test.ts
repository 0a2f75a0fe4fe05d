import { expect, test } from 'vitest';
import { CAUTIONS } from '../../src/model/cautions.ts';

test('cautions name the design-aid status, local rules and on-site verification', () => {
  const text = CAUTIONS.join(' ');
  expect(text).toMatch(/design aid/);
  expect(text).toMatch(/supply company/);
  expect(text).toMatch(/competent person/);
});
