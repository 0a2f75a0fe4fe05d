// Browser tests for the keyboard shortcuts the help overlay lists (with the platform's modifier),
// and for splitting a cable with a junction from the cable's context menu.
import { afterEach, beforeEach, expect, inject, test } from 'vitest';
import { openSession, screenshot, type Session } from './browser.ts';
import { EditorPage } from './editorPage.ts';
import { smallNetwork } from '../unit/commands/fixture.ts';
import { SHORTCUTS } from '../../src/ui/shortcuts.ts';
import { GRID } from '../../src/model/layout.ts';

let s: Session;
let ed: EditorPage;
beforeEach(async () => {
  s = await openSession();
  ed = new EditorPage(s.page);
  await ed.open(inject('baseUrl'));
  const doc = smallNetwork();
  doc.details.title = 'Keys test';
  await ed.openDocument(doc);
});
afterEach(async () => {
  await s.close();
});

const MOD = 'ControlOrMeta';

async function viewport(page: Session['page']) {
  return page.locator('.react-flow__viewport').evaluate((el) => (el as HTMLElement).style.transform);
}

test('the help overlay lists every shortcut from the one list, and Esc closes it', async () => {
  await s.page.keyboard.press('?');
  const help = s.page.getByTestId('help-overlay');
  await help.waitFor();
  const rows = await help
    .locator('[data-shortcut]')
    .evaluateAll((els) => els.map((e) => e.getAttribute('data-shortcut')));
  expect(rows).toEqual(SHORTCUTS.map((k) => k.id));
  await screenshot(s.page, 'keys-help');
  await s.page.keyboard.press('Escape');
  await expect.poll(() => help.count()).toBe(0);
  expect(s.errors).toEqual([]);
});

test('delete, undo and redo with the platform keys', async () => {
  await ed.node('L1').click();
  await s.page.keyboard.press('Delete');
  await expect.poll(() => ed.node('L1').count()).toBe(0);
  await expect.poll(() => ed.edges().count()).toBe(2); // the load's cable went with it
  await s.page.keyboard.press(`${MOD}+z`);
  await expect.poll(() => ed.node('L1').count()).toBe(1);
  await expect.poll(() => ed.edges().count()).toBe(3);
  await s.page.keyboard.press(`${MOD}+Shift+z`);
  await expect.poll(() => ed.node('L1').count()).toBe(0);
  await s.page.keyboard.press(`${MOD}+z`);
  await expect.poll(() => ed.node('L1').count()).toBe(1);
  if (process.platform !== 'darwin') {
    await s.page.keyboard.press('Control+y');
    await expect.poll(() => ed.node('L1').count()).toBe(0);
    await s.page.keyboard.press('Control+z');
  }
  // Backspace deletes too.
  await ed.node('L2').click();
  await s.page.keyboard.press('Backspace');
  await expect.poll(() => ed.node('L2').count()).toBe(0);
  expect(s.errors).toEqual([]);
});

test('copy and paste, select all and Esc', async () => {
  await ed.node('DB1').click();
  await ed.node('L1').click({ modifiers: [MOD] });
  await s.page.keyboard.press(`${MOD}+c`);
  await s.page.keyboard.press(`${MOD}+v`);
  // Two new nodes and the cable between them; the cable to the original board is not copied.
  await expect.poll(() => ed.nodeIds()).toEqual(['DB1', 'DB2', 'L1', 'L2', 'L3', 'S1']);
  await expect.poll(() => ed.edges().count()).toBe(4);
  await s.page.keyboard.press(`${MOD}+a`);
  await expect.poll(() => s.page.locator('.react-flow__node.selected').count()).toBe(6);
  await s.page.keyboard.press('Escape');
  await expect.poll(() => s.page.locator('.react-flow__node.selected').count()).toBe(0);
  // Duplicate is copy and paste in one.
  await ed.node('L2').click();
  await s.page.keyboard.press(`${MOD}+d`);
  await expect.poll(() => ed.nodeIds()).toContain('L4');
  expect(s.errors).toEqual([]);
});

test('arrow keys nudge the selection a grid step, with Shift four steps, each one undo step', async () => {
  await ed.node('L1').click();
  const start = await ed.nodePosition('L1');
  await s.page.keyboard.press('ArrowRight');
  await expect.poll(() => ed.nodePosition('L1')).toEqual({ x: start.x + GRID, y: start.y });
  await s.page.keyboard.press('Shift+ArrowDown');
  await expect.poll(() => ed.nodePosition('L1')).toEqual({ x: start.x + GRID, y: start.y + 4 * GRID });
  await s.page.keyboard.press('ArrowLeft');
  await s.page.keyboard.press('ArrowUp');
  await expect.poll(() => ed.nodePosition('L1')).toEqual({ x: start.x, y: start.y + 3 * GRID });
  await s.page.keyboard.press(`${MOD}+z`);
  await expect.poll(() => ed.nodePosition('L1')).toEqual({ x: start.x, y: start.y + 4 * GRID });
  expect(s.errors).toEqual([]);
});

test('fit, 1:1, the opening view and tidy from the keyboard', async () => {
  await s.page.keyboard.press('Shift+Digit0');
  await expect.poll(() => viewport(s.page)).toMatch(/scale\(1\)/);
  await s.page.keyboard.press('Shift+Digit1');
  await expect.poll(() => viewport(s.page)).not.toMatch(/scale\(1\)/);
  await s.page.waitForTimeout(400);
  const canvasBox = (await s.page.getByTestId('canvas').boundingBox())!;
  for (const id of ['S1', 'DB1', 'L1', 'L2']) {
    const b = (await ed.node(id).boundingBox())!;
    expect(b.x).toBeGreaterThanOrEqual(canvasBox.x);
    expect(b.y).toBeGreaterThanOrEqual(canvasBox.y);
    expect(b.x + b.width).toBeLessThanOrEqual(canvasBox.x + canvasBox.width);
    expect(b.y + b.height).toBeLessThanOrEqual(canvasBox.y + canvasBox.height);
  }
  const fitted = await viewport(s.page);
  await s.page.keyboard.press('Shift+Digit0');
  await s.page.keyboard.press('Shift+Digit2');
  // A small project opens fitted whole, so the opening view is the fitted one.
  await expect.poll(() => viewport(s.page)).toBe(fitted);
  const before = await ed.nodePosition('L1');
  await s.page.keyboard.press('Shift+t');
  await expect.poll(() => ed.nodePosition('L1')).not.toEqual(before);
  expect(s.errors).toEqual([]);
});

test('a cable is split with a junction from its context menu, in one undo step', async () => {
  await ed.rightClickCable('C2', 'L1');
  const menu = s.page.getByTestId('context-menu');
  await menu.waitFor();
  await screenshot(s.page, 'keys-cable-menu');
  await menu.getByRole('menuitem', { name: 'Split with a junction' }).click();
  await ed.node('J1').waitFor();
  await expect.poll(() => ed.edges().count()).toBe(4);
  await expect
    .poll(() => s.page.getByTestId('notice').textContent())
    .toMatch(/C2 now runs 15 m to junction J1, then C4 15 m/);
  await expect.poll(async () => (await ed.cableLabel('C4').textContent()) ?? '').toContain('Σ');
  await screenshot(s.page, 'keys-split');
  await s.page.keyboard.press(`${MOD}+z`);
  await expect.poll(() => ed.node('J1').count()).toBe(0);
  await expect.poll(() => ed.edges().count()).toBe(3);
  await s.page.keyboard.press(`${MOD}+Shift+z`);
  await expect.poll(() => ed.node('J1').count()).toBe(1);
  expect(s.errors).toEqual([]);
});
