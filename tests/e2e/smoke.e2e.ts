import { afterEach, beforeEach, expect, inject, test } from 'vitest';
import { openSession, screenshot, type Session } from './browser.ts';

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

test('the editor loads and shows the cautions', async () => {
  await s.page.goto(inject('baseUrl'));
  await s.page.getByTestId('app').waitFor();
  await expect(s.page.getByText('design aid', { exact: false }).first().isVisible()).resolves.toBe(true);
  await screenshot(s.page, 'smoke');
  expect(s.errors).toEqual([]);
});
