import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import type { ProjectDocument } from '../../src/model/types.ts';
import { serializeDocument } from '../../src/model/serializeDocument.ts';

/** Page object for the editor's canvas, tray and top bar. */
export class EditorPage {
  constructor(readonly page: Page) {}

  async open(url: string, { acknowledge = true } = {}) {
    await this.page.goto(url);
    await this.page.getByTestId('app').waitFor();
    if (acknowledge) {
      await this.page.getByTestId('cautions-dialog').waitFor();
      await this.page.getByTestId('cautions-ok').click();
    }
    await this.page.locator('.react-flow__node').first().waitFor();
  }

  /** Opens a document through the file picker, as a user would. */
  async openDocument(doc: ProjectDocument, name = 'test.dropline.json') {
    const file = join(mkdtempSync(join(tmpdir(), 'dropline-open-')), name);
    writeFileSync(file, serializeDocument(doc));
    await this.page.getByTestId('open-file-input').setInputFiles(file);
    await expect.poll(() => this.page.getByTestId('project-title').textContent()).toBe(doc.details.title);
    await this.page.waitForTimeout(100);
  }

  /** The ids of the nodes on the canvas, sorted. */
  async nodeIds(): Promise<string[]> {
    const ids = await this.page
      .locator('.react-flow__node')
      .evaluateAll((els) => els.map((e) => e.getAttribute('data-id') ?? ''));
    return ids.sort();
  }

  /** Right-clicks a cable on its last straight run, just above the element it feeds. */
  async rightClickCable(id: string, to: string) {
    const handle = await this.centreOf(this.node(to).locator('.react-flow__handle-top'));
    await this.page.mouse.click(handle.x, handle.y - 12, { button: 'right' });
  }

  node(id: string): Locator {
    return this.page.getByTestId(`node-${id}`);
  }

  cableLabel(id: string): Locator {
    return this.page.getByTestId(`cable-label-${id}`);
  }

  edges(): Locator {
    return this.page.locator('.react-flow__edge');
  }

  /** Drags a tray part onto the canvas at a point relative to the canvas's top-left corner. */
  async dropPart(part: string, x: number, y: number) {
    await this.page
      .getByTestId(`part-${part}`)
      .dragTo(this.page.getByTestId('canvas'), { targetPosition: { x, y } });
  }

  private async centreOf(l: Locator) {
    const box = await l.boundingBox();
    if (!box) throw new Error('element is not on screen');
    return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
  }

  /** Draws a cable with the mouse from the bottom handle of one node to the top handle of another. */
  async connect(from: string, to: string) {
    const a = await this.centreOf(this.node(from).locator('.react-flow__handle-bottom'));
    const b = await this.centreOf(this.node(to).locator('.react-flow__handle-top'));
    const m = this.page.mouse;
    await m.move(a.x, a.y);
    await m.down();
    for (let i = 1; i <= 12; i++) await m.move(a.x + ((b.x - a.x) * i) / 12, a.y + ((b.y - a.y) * i) / 12);
    await m.up();
  }

  /** Drags a node by (dx, dy) screen pixels in small steps, as a hand would. */
  async dragNode(id: string, dx: number, dy: number) {
    const box = await this.node(id).boundingBox();
    if (!box) throw new Error(`node ${id} is not on screen`);
    // Grab the node near its left edge, away from the handles and the badge.
    const x = box.x + 12;
    const y = box.y + box.height / 2;
    const m = this.page.mouse;
    await m.move(x, y);
    await m.down();
    for (let i = 1; i <= 10; i++) await m.move(x + (dx * i) / 10, y + (dy * i) / 10);
    await m.up();
  }

  /** Canvas position of a node as React Flow draws it (its transform). */
  async nodePosition(id: string) {
    const t = await this.page
      .locator(`.react-flow__node[data-id="${id}"]`)
      .evaluate((el) => (el as HTMLElement).style.transform);
    const m = /translate\(([-\d.]+)px, ?([-\d.]+)px\)/.exec(t);
    expect(m, `transform of ${id}: ${t}`).not.toBeNull();
    return { x: Number(m![1]), y: Number(m![2]) };
  }

  async click(testId: string) {
    await this.page.getByTestId(testId).click();
  }

  /** The numbers in a label, in order (e.g. "13.7 A · 2.10 V 0.91 %" gives [13.7, 2.1, 0.91]). */
  async numbersIn(l: Locator): Promise<number[]> {
    const text = (await l.textContent()) ?? '';
    return [...text.matchAll(/-?\d+(?:\.\d+)?/g)].map((m) => Number(m[0])).filter((n) => !Number.isNaN(n));
  }
}
