// Browser tests for the details panel, schedules, findings and dialogs, on the demo project.
// Figures on screen are compared with the engine's own, solved here in Node from the same file.
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { afterEach, beforeEach, expect, inject, test } from 'vitest';
import type { Page } from 'playwright-core';
import { openSession, readAutosave, screenshot, type Session } from './browser.ts';
import { parseDocument } from '../../src/model/parseDocument.ts';
import { solve } from '../../src/solver/solve.ts';
import type { ProjectDocument } from '../../src/model/types.ts';

/**
 * A cable measured on the plan has, as its length, its route's legs (each |Δx| + |Δy|, through
 * any bends) plus its allowance, rounded up to 0.1 m: worked out here on its own, not by the app's code.
 */
function expectMeasuredOnPlan(doc: ProjectDocument, cable: ProjectDocument['cables'][number]): void {
  const at = new Map(doc.nodes.map((n) => [n.id, n.plan]));
  const points = [at.get(cable.from)!, ...(cable.route!.via ?? []), at.get(cable.to)!];
  let d = cable.route!.allowanceM;
  for (let k = 1; k < points.length; k++)
    d += Math.abs(points[k]!.xM - points[k - 1]!.xM) + Math.abs(points[k]!.yM - points[k - 1]!.yM);
  expect(cable.lengthM).toBeGreaterThanOrEqual(d - 1e-9);
  expect(cable.lengthM).toBeLessThan(d + 0.1 + 1e-9);
}

function demo(): ProjectDocument {
  const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.doc;
}

/** Page object for the panels. */
class Panels {
  constructor(readonly page: Page) {}
  async start() {
    await this.page.goto(inject('baseUrl'));
    await this.page.getByTestId('app').waitFor();
    await this.page.getByTestId('cautions-dialog').waitFor();
    await this.page.getByTestId('cautions-ok').click();
  }
  details() {
    return this.page.getByTestId('details-panel');
  }
  async openSchedules() {
    await this.page.getByRole('button', { name: 'Schedules', exact: true }).click();
    await this.page.getByTestId('schedules-drawer').waitFor();
  }
  async pickRow(sheet: 'cables' | 'loads' | 'boards', id: string) {
    await this.page.getByTestId(`sheet-${sheet}`).click();
    await this.page.getByTestId(`schedule-${sheet}`).locator(`tr[data-row="${id}"]`).click();
  }
  async tab(name: 'inputs' | 'results' | 'working') {
    await this.page.getByTestId(`details-tab-${name}`).click();
  }
}

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

test('cautions show at first start, are remembered once acknowledged, and stay reachable', async () => {
  const ui = new Panels(s.page);
  await ui.start();
  await expect(s.page.getByTestId('cautions-dialog').count()).resolves.toBe(0);
  await s.page.reload();
  await s.page.getByTestId('app').waitFor();
  await s.page.waitForTimeout(500);
  await expect(s.page.getByTestId('cautions-dialog').count()).resolves.toBe(0);
  await s.page.getByRole('button', { name: 'Cautions', exact: true }).click();
  await expect(s.page.getByTestId('cautions-dialog').textContent()).resolves.toContain('design aid');
  expect(s.errors).toEqual([]);
});

test('a schedule row selects the element; the details show the engine’s figures and its working', async () => {
  const doc = demo();
  const results = solve(doc);
  const load = doc.nodes.find((n) => n.kind === 'load' && (results.loads[n.id]?.path.length ?? 0) >= 2)!;
  const ui = new Panels(s.page);
  await ui.start();
  await ui.openSchedules();
  await screenshot(s.page, 'panels-schedules');
  await ui.pickRow('loads', load.id);
  await expect(ui.details().getByTestId('details-title').textContent()).resolves.toBe(load.name);
  await ui.tab('results');
  const expected = `${results.loads[load.id]!.cumulativePct.value.toFixed(2)} % of U0`;
  await expect(ui.details().getByTestId('figure-cumulative').first().textContent()).resolves.toBe(expected);
  const points = ui.details().getByTestId('profile-point');
  await expect(points.count()).resolves.toBe(results.loads[load.id]!.path.length + 1);
  await screenshot(s.page, 'panels-load-results');
  await ui.tab('working');
  await ui.details().locator('[data-testid="working-list"] details summary').first().click();
  const firstWorking = results.loads[load.id]!.working[0]!;
  await expect(ui.details().getByTestId('working-list').first().textContent()).resolves.toContain(
    firstWorking.formula,
  );
  await screenshot(s.page, 'panels-load-working');
  expect(s.errors).toEqual([]);
});

test('the expected test values sheet gives the engine’s cold Zs and leaves the measured columns to the CSV', async () => {
  const doc = demo();
  const results = solve(doc);
  const ui = new Panels(s.page);
  await ui.start();
  await ui.openSchedules();
  await s.page.getByTestId('sheet-tests').click();
  await expect(s.page.getByTestId('schedule-note').textContent()).resolves.toContain('conductors at 20 °C');
  const table = s.page.getByTestId('schedule-tests');
  // Columns to fill in on site are not on screen.
  await expect(table.locator('th', { hasText: 'Zs meas.' }).count()).resolves.toBe(0);
  const load = doc.nodes.find((n) => n.kind === 'load' && results.loads[n.id]?.protection)!;
  const zs = results.loads[load.id]!.protection!.zsColdOhm.toFixed(3);
  await expect(table.locator(`tr[data-row="${load.id}"]`).textContent()).resolves.toContain(zs);
  await screenshot(s.page, 'panels-expected-tests');
  const [file] = await Promise.all([
    s.page.waitForEvent('download'),
    s.page.getByTestId('schedule-csv').click(),
  ]);
  const text = readFileSync((await file.path())!, 'utf8');
  expect(text).toContain('Note,"Expected values from the design');
  expect(text).toMatch(/R1\+R2 meas\.,Zs meas\.,IR MΩ,RCD ms,Polarity\r\n/);
  expect(s.errors).toEqual([]);
});

test('the cable schedule downloads as a CSV that holds every cable with the engine’s figures', async () => {
  const doc = demo();
  const results = solve(doc);
  const ui = new Panels(s.page);
  await ui.start();
  await ui.openSchedules();
  // The filter hides rows on screen; the file keeps every row.
  await s.page.getByTestId('filter-within').uncheck();
  const [file] = await Promise.all([
    s.page.waitForEvent('download'),
    s.page.getByTestId('schedule-csv').click(),
  ]);
  expect(file.suggestedFilename()).toBe(`${doc.details.reference}-cable-schedule.csv`);
  const text = readFileSync((await file.path())!, 'utf8');
  expect(text).toContain('Caution,Dropline is a design aid.');
  const lines = text.split('\r\n');
  const head = lines.findIndex((l) => l.startsWith('Id,'));
  expect(lines.slice(head + 1, -1).map((l) => l.split(',')[0])).toEqual(doc.cables.map((c) => c.id));
  const worst = doc.cables.find((c) => results.cables[c.id]?.status === 'over')!;
  expect(lines.find((l) => l.startsWith(`${worst.id},`))?.split(',')[1]).toBe('over');
  expect(s.errors).toEqual([]);
});

test('Tender pack PDF downloads the pack of the open project, as a PDF reader sees it', async () => {
  const doc = demo();
  const results = solve(doc);
  const ui = new Panels(s.page);
  await ui.start();
  const [file] = await Promise.all([
    s.page.waitForEvent('download', { timeout: 60_000 }),
    (async () => {
      await s.page.getByTestId('export-pack').click();
      await s.page.getByTestId('pack-dialog').waitFor();
      await screenshot(s.page, 'pack-dialog');
      await s.page.getByTestId('pack-download').click();
    })(),
  ]);
  expect(file.suggestedFilename()).toBe(
    `${doc.details.reference}-rev-${doc.details.revision}-tender-pack.pdf`,
  );
  const path = (await file.path())!;
  // poppler reads it back: A3 landscape, the sheets, the figures the engine gives.
  expect(execFileSync('pdfinfo', [path], { encoding: 'utf8' })).toMatch(
    /Page size:\s+1190\.55 x 841\.89 pts \(A3\)/,
  );
  const text = execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', path, '-'], { encoding: 'utf8' }).replace(
    /\s+/g,
    ' ',
  );
  for (const sheet of [
    'Single-line diagram',
    'Summary, data and cautions',
    'Cable schedule',
    'Findings',
    'Working',
  ])
    expect(text).toContain(sheet);
  expect(text).toContain('Design aid only.');
  for (const c of doc.cables) expect(text).toContain(c.id);
  const over = Object.entries(results.loads).find(([, l]) => l.status === 'over')!;
  expect(text).toContain(`Load ${over[0]}`);
  await expect(s.page.getByTestId('notice').textContent()).resolves.toContain('Downloaded');
  expect(s.errors).toEqual([]);
});

test('the pack dialog also downloads the drawing as SVG, with every element and the caution', async () => {
  const doc = demo();
  const ui = new Panels(s.page);
  await ui.start();
  await s.page.getByTestId('export-pack').click();
  const [file] = await Promise.all([
    s.page.waitForEvent('download'),
    s.page.getByTestId('svg-download').click(),
  ]);
  expect(file.suggestedFilename()).toBe(
    `${doc.details.reference}-rev-${doc.details.revision}-single-line.svg`,
  );
  const svg = readFileSync((await file.path())!, 'utf8');
  // The browser's own XML parser reads it back.
  const texts = await s.page.evaluate((text) => {
    const parsed = new DOMParser().parseFromString(text, 'image/svg+xml');
    if (parsed.querySelector('parsererror')) return null;
    return [...parsed.querySelectorAll('text')].map((t) => t.textContent ?? '');
  }, svg);
  expect(texts).not.toBeNull();
  for (const id of [...doc.nodes.map((n) => n.id), ...doc.cables.map((c) => c.id)])
    expect(texts).toContain(id);
  expect(texts!.join(' ')).toContain('Design aid only');
  expect(s.errors).toEqual([]);
});

test('a bad length is refused in place; a good one changes the cumulative drop to the engine’s value', async () => {
  const doc = demo();
  const results = solve(doc);
  const cable = doc.cables.find(
    (c) => results.cables[c.id] && doc.nodes.some((n) => n.id === c.to && n.kind === 'load'),
  )!;
  const ui = new Panels(s.page);
  await ui.start();
  await ui.openSchedules();
  await ui.pickRow('cables', cable.id);
  const length = ui.details().getByLabel('Route length (one way)');
  await length.fill('long');
  await length.press('Enter');
  const alert = ui.details().getByRole('alert');
  await expect(alert.textContent()).resolves.toContain('not a number');
  await screenshot(s.page, 'panels-bad-length');
  await expect(s.page.getByRole('button', { name: 'Undo' }).isDisabled()).resolves.toBe(true);

  const newLength = cable.lengthM + 25;
  await length.fill(String(newLength));
  await length.press('Enter');
  await expect(alert.count()).resolves.toBe(0);
  const changed = {
    ...doc,
    cables: doc.cables.map((c) => (c.id === cable.id ? { ...c, lengthM: newLength } : c)),
  };
  const after = solve(changed).cables[cable.id]!.cumulativePct.value;
  await ui.tab('results');
  await expect(ui.details().getByTestId('figure-cumulative').textContent()).resolves.toBe(
    `${after.toFixed(2)} % of U0`,
  );
  expect(s.errors).toEqual([]);
});

test('the findings list goes to an element; help lists the shortcuts; project details save', async () => {
  const ui = new Panels(s.page);
  await ui.start();
  await s.page.getByRole('button', { name: /^Findings/ }).click();
  const findings = s.page.getByTestId('findings-list');
  await findings.waitFor();
  await screenshot(s.page, 'panels-findings');
  const go = findings.getByRole('button', { name: /^Go to/ });
  if ((await go.count()) > 0) {
    await go.first().click();
    await expect(ui.details().getByTestId('details-title').count()).resolves.toBe(1);
  }
  await s.page.getByRole('button', { name: 'Help', exact: true }).click();
  await expect(
    s.page.getByTestId('help-overlay').locator('[data-shortcut]').count(),
  ).resolves.toBeGreaterThan(5);
  await screenshot(s.page, 'panels-help');
  await s.page.keyboard.press('Escape');
  // The demo keeps a revision table (A, B): a new row is the next revision, and it needs a description.
  await s.page.getByRole('button', { name: 'Project', exact: true }).click();
  await s.page.getByTestId('rev-add').click();
  await expect(s.page.getByTestId('rev-2-revision').inputValue()).resolves.toBe('C');
  await s.page.getByTestId('project-save').click();
  await expect(s.page.getByTestId('project-dialog').textContent()).resolves.toContain(
    'Revision C: say what changed in this issue.',
  );
  await s.page.getByTestId('rev-2-description').fill('Yard sub-main in 35 mm²');
  await screenshot(s.page, 'panels-revisions');
  await s.page.getByTestId('project-save').click();
  await expect(s.page.getByTestId('project-dialog').count()).resolves.toBe(0);
  await s.page.waitForTimeout(700); // the autosave follows an edit after a short pause
  const saved = parseDocument(await readAutosave(s.page));
  if (!saved.ok) throw new Error(saved.errors.join('\n'));
  expect(saved.doc.details.revision).toBe('C');
  expect(saved.doc.details.revisions!.map((r) => r.revision)).toEqual(['A', 'B', 'C']);
  expect(saved.doc.details.revisions![2]!.description).toBe('Yard sub-main in 35 mm²');
  await s.page.getByRole('button', { name: 'Undo' }).click();
  await s.page.getByRole('button', { name: 'Project', exact: true }).click();
  await expect(s.page.getByTestId('rev-2-revision').count()).resolves.toBe(0);
  expect(s.errors).toEqual([]);
});

test('sizing proposals are reviewed, applied in part as one step, and undone', async () => {
  const ui = new Panels(s.page);
  await ui.start();
  await s.page.getByTestId('open-sizing').click();
  const table = s.page.getByTestId('proposals-table');
  await table.waitFor({ timeout: 60000 });
  await screenshot(s.page, 'panels-sizing');
  const rows = await table.locator('tbody tr').count();
  expect(rows).toBeGreaterThan(1);
  await table.locator('tbody tr input[type="checkbox"]').first().uncheck();
  await expect(s.page.getByTestId('proposals-apply').textContent()).resolves.toBe(
    `Apply ${rows - 1} of ${rows}`,
  );
  await s.page.getByTestId('proposals-apply').click();
  await expect(s.page.getByTestId('sizing-dialog').count()).resolves.toBe(0);
  const undo = s.page.getByRole('button', { name: 'Undo' });
  await expect(undo.isEnabled()).resolves.toBe(true);
  await undo.click();
  await expect(undo.isDisabled()).resolves.toBe(true);
  expect(s.errors).toEqual([]);
});

test('alternatives: keep the canvas design, compare with the demo’s alternative, open it, undo', async () => {
  const doc = demo();
  const alt = doc.alternatives[0]!;
  const before = solve(doc);
  const after = solve({ ...doc, settings: alt.settings, nodes: alt.nodes, cables: alt.cables });
  // The loads whose status the alternative changes, by the engine in Node from the same file.
  const flipped = doc.nodes
    .filter((n) => n.kind === 'load' && before.loads[n.id]!.status !== after.loads[n.id]!.status)
    .map((n) => n.id);
  expect(flipped.length).toBeGreaterThan(0);

  const ui = new Panels(s.page);
  await ui.start();
  const page = s.page;
  await page.getByTestId('open-alternatives').click();
  const dialog = page.getByTestId('alternatives-dialog');
  await expect(dialog.getByTestId('alt-row-0').textContent()).resolves.toContain(alt.name);
  await dialog.getByTestId('alt-name').fill(alt.name.toUpperCase());
  await expect(dialog.getByRole('alert').textContent()).resolves.toContain('already an alternative');
  await expect(dialog.getByTestId('alt-keep').isDisabled()).resolves.toBe(true);
  await dialog.getByTestId('alt-name').fill('As drawn');
  await dialog.getByTestId('alt-keep').click();
  await expect(dialog.getByTestId('alt-row-1').textContent()).resolves.toContain('As drawn');

  await dialog.getByTestId('alt-row-0').getByRole('button', { name: 'Compare' }).click();
  const changed = dialog.getByTestId('compare-status');
  for (const id of flipped) await expect(changed.textContent()).resolves.toContain(id);
  const l = flipped[0]!;
  const drop = (r: typeof before) => r.loads[l]!.cumulativePct.value.toFixed(2);
  const row = changed.locator('tr', { hasText: l });
  await expect(row.textContent()).resolves.toContain(drop(before));
  await expect(row.textContent()).resolves.toContain(drop(after));
  await expect(dialog.getByTestId('compare-cables').textContent()).resolves.toContain('→ 35 mm²');
  await screenshot(page, 'alternatives-compare');

  // The canvas design is kept as "As drawn", so opening the alternative asks nothing.
  await dialog.getByTestId('alt-back').click();
  await dialog.getByTestId('alt-row-0').getByRole('button', { name: 'Open' }).click();
  await expect(page.getByTestId('alternatives-dialog').count()).resolves.toBe(0);
  await ui.openSchedules();
  await ui.pickRow('loads', l);
  await ui.tab('results');
  await expect(ui.details().getByTestId('figure-cumulative').textContent()).resolves.toBe(
    `${after.loads[l]!.cumulativePct.value.toFixed(2)} % of U0`,
  );
  await page.getByRole('button', { name: 'Undo' }).click();
  await ui.pickRow('loads', l);
  await ui.tab('results');
  await expect(ui.details().getByTestId('figure-cumulative').textContent()).resolves.toBe(
    `${before.loads[l]!.cumulativePct.value.toFixed(2)} % of U0`,
  );
  expect(s.errors).toEqual([]);
});

test('site plan: dragging a board re-measures its cables while it moves; the engine agrees; undo', async () => {
  const ui = new Panels(s.page);
  await ui.start();
  const page = s.page;
  await page.getByTestId('canvas-plan').click();
  const label = page.getByTestId('plan-cable-C28');
  await expect(label.textContent()).resolves.toBe('C28 · 38.0 m');
  const marker = page.getByTestId('plan-marker-DB4');
  const box = (await marker.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x - 60, box.y - 40, { steps: 8 });
  // Still dragging: the sub-main is shorter already.
  const during = Number(/([\d.]+) m/.exec((await label.textContent()) ?? '')![1]);
  expect(during).toBeLessThan(38);
  await screenshot(page, 'site-plan-drag');
  await page.mouse.up();
  await page.waitForTimeout(700);

  // The autosaved document: every cable measured on the plan has the length its route gives,
  // and the details show the engine's figure for a load below the moved board.
  const text = await readAutosave(page);
  const parsed = parseDocument(text);
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  const doc = parsed.doc;
  for (const c of doc.cables.filter((x) => x.route)) expectMeasuredOnPlan(doc, c);
  const c28 = doc.cables.find((c) => c.id === 'C28')!;
  await expect(label.textContent()).resolves.toBe(`C28 · ${c28.lengthM.toFixed(1)} m`);
  const l27 = solve(doc).loads.L27!.cumulativePct.value;
  expect(l27).not.toBeCloseTo(solve(demo()).loads.L27!.cumulativePct.value, 3);
  await ui.openSchedules();
  await ui.pickRow('loads', 'L27');
  await ui.tab('results');
  await expect(ui.details().getByTestId('figure-cumulative').textContent()).resolves.toBe(
    `${l27.toFixed(2)} % of U0`,
  );

  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(label.textContent()).resolves.toBe('C28 · 38.0 m');

  // The scale from two points: two clicks on the plan, said to be twice as far apart as they
  // now measure, double the plan and every measured length with it (DB4's and J1's positions too).
  await page.getByTestId('plan-scale').click();
  const pane = (await page.getByTestId('plan-canvas').boundingBox())!;
  const y = pane.y + 170; // below the plan bar, above the buildings (the schedules drawer is open below)
  await page.mouse.click(pane.x + 300, y);
  await page.mouse.click(pane.x + 400, y);
  const now = Number(
    /now ([\d.]+) m/.exec((await page.getByTestId('plan-scale-pick').textContent()) ?? '')![1],
  );
  expect(now).toBeGreaterThan(0);
  await page.getByTestId('plan-scale-metres').fill(String(now * 2));
  await page.getByTestId('plan-scale-apply').click();
  await expect(page.getByTestId('plan-width').inputValue()).resolves.toMatch(/^26\d/);
  const doubled = Number(/([\d.]+) m/.exec((await label.textContent()) ?? '')![1]);
  const allowance = demo().cables.find((c) => c.id === 'C28')!.route!.allowanceM;
  // 38 m was (distance + allowance); twice the distance plus the same allowance, within a tenth
  // and the rounding of the two clicks.
  expect(doubled).toBeGreaterThan(2 * (38 - allowance) + allowance - 1);
  expect(doubled).toBeLessThan(2 * (38 - allowance) + allowance + 1);
  expect(s.errors).toEqual([]);
});

test('site plan: a part clicked in the tray lands on the plan, fed from the selected board and measured there', async () => {
  const ui = new Panels(s.page);
  await ui.start();
  const page = s.page;
  await page.getByTestId('canvas-plan').click();
  await page.getByTestId('plan-marker-DB4').click();
  await page.getByTestId('part-load:sockets').click();
  await page.waitForTimeout(700);
  const parsed = parseDocument(await readAutosave(page));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  const saved = parsed.doc;
  const before = new Set(demo().nodes.map((n) => n.id));
  const added = saved.nodes.filter((n) => !before.has(n.id));
  expect(added).toHaveLength(1);
  const node = added[0]!;
  expect(node.plan).toBeDefined();
  await expect(page.getByTestId(`plan-marker-${node.id}`).count()).resolves.toBe(1);
  // Its cable comes from DB4 and is measured on the plan with the bar's allowance (2 m):
  // |Δx| + |Δy| + 2, rounded up to 0.1 m (common practice for routes along walls and trays).
  const fed = saved.cables.find((c) => c.to === node.id)!;
  expect(fed.from).toBe('DB4');
  expect(fed.route).toEqual({ allowanceM: 2 });
  expectMeasuredOnPlan(saved, fed);
  // One undo step takes both away.
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.getByTestId(`plan-marker-${node.id}`).count()).resolves.toBe(0);
  expect(s.errors).toEqual([]);
});

test('site plan: a bend added to a route and dragged round an obstacle lengthens the cable as measured', async () => {
  const ui = new Panels(s.page);
  await ui.start();
  const page = s.page;
  await page.getByTestId('canvas-plan').click();
  const label = page.getByTestId('plan-cable-C28');
  await expect(label.textContent()).resolves.toBe('C28 · 38.0 m');
  // C28 runs from J1 along x, then down to DB4: a double-click on its vertical leg puts a bend there.
  const j1 = (await page.getByTestId('plan-marker-J1').boundingBox())!;
  const db4 = (await page.getByTestId('plan-marker-DB4').boundingBox())!;
  await page.mouse.dblclick(db4.x + db4.width / 2, (j1.y + j1.height / 2 + db4.y + db4.height / 2) / 2);
  const bend = page.getByTestId('plan-bend-C28-0');
  await bend.waitFor();
  // On the route, so the length stands until the bend moves.
  await expect(label.textContent()).resolves.toBe('C28 · 38.0 m');
  const box = (await bend.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + 80, box.y + box.height / 2, { steps: 6 });
  const during = Number(/([\d.]+) m/.exec((await label.textContent()) ?? '')![1]);
  expect(during).toBeGreaterThan(38);
  await page.mouse.up();
  await page.waitForTimeout(700);
  await screenshot(page, 'site-plan-bend');

  // The saved route passes through the bend, and its length is the legs, each along x then y,
  // plus the allowance (rounded up to 0.1 m).
  const parsed = parseDocument(await readAutosave(page));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  const c28 = parsed.doc.cables.find((c) => c.id === 'C28')!;
  expect(c28.route!.via).toHaveLength(1);
  expectMeasuredOnPlan(parsed.doc, c28);
  await expect(label.textContent()).resolves.toBe(`C28 · ${c28.lengthM.toFixed(1)} m`);
  expect(solve(parsed.doc).cables.C28!.working.find((w) => w.key === 'drop')!.inputs[0]!.source).toMatch(
    /through its 1 bend/,
  );

  // A double-click on the bend takes it away; undo brings it back.
  await page.getByTestId('plan-bend-C28-0').dblclick();
  await expect(label.textContent()).resolves.toBe('C28 · 38.0 m');
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(label.textContent()).resolves.toBe(`C28 · ${c28.lengthM.toFixed(1)} m`);
  expect(s.errors).toEqual([]);
});

test('parts clicked in the tray hang off the selected board and come into view', async () => {
  const ui = new Panels(s.page);
  await ui.start();
  const page = s.page;
  await page.getByRole('button', { name: 'New', exact: true }).click();
  await page.locator('.react-flow__node').first().click();
  await page.getByTestId('part-board').click();
  for (let k = 0; k < 3; k++) await page.getByTestId('part-load:sockets').click();
  await page.waitForTimeout(500);
  const pane = (await page.locator('.react-flow').boundingBox())!;
  const nodes = page.locator('.react-flow__node');
  await expect(nodes.count()).resolves.toBe(5);
  // The last one added is on screen, inside the canvas.
  const last = (await nodes.nth(4).boundingBox())!;
  expect(last.x).toBeGreaterThanOrEqual(pane.x);
  expect(last.y).toBeGreaterThanOrEqual(pane.y);
  expect(last.x + last.width).toBeLessThanOrEqual(pane.x + pane.width);
  expect(last.y + last.height).toBeLessThanOrEqual(pane.y + pane.height);
  await screenshot(page, 'tray-parts-in-view');
  expect(s.errors).toEqual([]);
});
