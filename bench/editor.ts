/**
 * Editor benchmark: in headless Chromium, a generated 1,000-element diagram (nodes plus cables),
 * a board dragged with the mouse for 60 frames at 100 % zoom. Reports the median and p95 interval
 * between frames (requestAnimationFrame timestamps during the drag), and the ratio of main-thread
 * work per frame with live labels on to the same drag with labels off, measured in the same run
 * in alternating rounds after an untimed warm-up pair (the median of each on round over the off
 * round after it). Work is Chromium's own TaskDuration metric (script, style, layout and paint on
 * the main thread), read through the DevTools protocol before and after each drag.
 */
import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { randomNetwork } from './randomNetwork.ts';
import { CHROMIUM, CHROMIUM_ARGS as ARGS, freePort, waitFor } from '../tests/e2e/host.ts';
import { tidyPositions } from '../src/model/layout.ts';
import { serializeDocument } from '../src/model/serializeDocument.ts';

const ELEMENTS = 1000;
const FRAMES = 60;
const ROUNDS = 5;
/** Untimed drag pairs first, so the timed rounds run compiled code with warm caches. */
const WARMUP_PAIRS = 1;
function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * (s.length - 1) + 0.5))] ?? NaN;
}

const METRICS = ['TaskDuration', 'ScriptDuration', 'RecalcStyleDuration', 'LayoutDuration'] as const;
type Metrics = Record<(typeof METRICS)[number], number>;

async function readMetrics(cdp: {
  send(m: 'Performance.getMetrics'): Promise<{ metrics: { name: string; value: number }[] }>;
}): Promise<Metrics> {
  const { metrics } = await cdp.send('Performance.getMetrics');
  const out = {} as Metrics;
  for (const k of METRICS) out[k] = metrics.find((m) => m.name === k)?.value ?? NaN;
  return out;
}

/** One drag of FRAMES mouse moves, one per frame; returns the frame intervals seen in the page. */
async function drag(
  page: Page,
  x: number,
  y: number,
  direction: { x: number; y: number },
): Promise<number[]> {
  // Scripts go in as text: tsx would otherwise wrap the functions in helpers the page lacks.
  await page.evaluate(`(() => {
    const w = window;
    w.__frames = [];
    w.__stop = false;
    const tick = (t) => {
      w.__frames.push(t);
      if (!w.__stop) requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
  })()`);
  const m = page.mouse;
  await m.move(x, y);
  await m.down();
  for (let i = 1; i <= FRAMES; i++) {
    await m.move(x + direction.x * i * 2, y + direction.y * i);
    await page.evaluate('new Promise((r) => requestAnimationFrame(() => r(null)))');
  }
  await m.up();
  const frames = (await page.evaluate(
    '(() => { window.__stop = true; return window.__frames; })()',
  )) as number[];
  const intervals: number[] = [];
  for (let i = 1; i < frames.length; i++) intervals.push(frames[i]! - frames[i - 1]!);
  return intervals;
}

export async function runEditorBench(): Promise<{
  elements: number;
  medianMs: number;
  p95Ms: number;
  overlayRatio: number;
  [more: string]: unknown;
}> {
  const build = spawnSync(
    process.execPath,
    ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'error'],
    {
      stdio: 'inherit',
    },
  );
  if (build.status !== 0) throw new Error('vite build failed');
  const port = await freePort();
  const server = spawn(
    process.execPath,
    [
      'node_modules/vite/bin/vite.js',
      'preview',
      '--host',
      '127.0.0.1',
      '--port',
      String(port),
      '--strictPort',
    ],
    { stdio: 'ignore' },
  );
  const dir = mkdtempSync(join(tmpdir(), 'dropline-bench-'));
  try {
    const doc = randomNetwork(ELEMENTS, 20261201);
    const positions = tidyPositions(doc);
    for (const n of doc.nodes) n.position = positions[n.id] ?? n.position;
    const file = join(dir, 'bench-diagram.json');
    writeFileSync(file, serializeDocument(doc));
    const url = `http://127.0.0.1:${port}/`;
    await waitFor(url, 30000);

    const context = await chromium.launchPersistentContext(join(dir, 'profile'), {
      executablePath: CHROMIUM,
      headless: true,
      args: ARGS,
      viewport: { width: 1440, height: 900 },
    });
    const page = context.pages()[0] ?? (await context.newPage());
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(String(e)));
    await page.goto(url);
    await page.getByTestId('cautions-ok').click();
    await page.getByTestId('open-file-input').setInputFiles(file);
    await page.getByText('Opened bench-diagram.json').waitFor();
    await page.waitForTimeout(500);
    await page.keyboard.press('Shift+Digit0');
    await page.waitForTimeout(300);

    // The board drawn nearest the middle of the canvas.
    const canvasBox = (await page.getByTestId('canvas').boundingBox())!;
    const cx = canvasBox.x + canvasBox.width / 2;
    const cy = canvasBox.y + canvasBox.height / 2;
    const boards = (await page.evaluate(`[...document.querySelectorAll('.ed-node-board')].map((e) => {
      const r = e.getBoundingClientRect();
      return { x: r.left + 12, y: r.top + r.height / 2 };
    })`)) as { x: number; y: number }[];
    const target = boards.sort((a, b) => Math.hypot(a.x - cx, a.y - cy) - Math.hypot(b.x - cx, b.y - cy))[0];
    if (!target) throw new Error('no board on screen to drag');
    const visibleNodes = await page.locator('.react-flow__node').count();
    const visibleEdges = await page.locator('.react-flow__edge').count();

    const cdp = await context.newCDPSession(page);
    await cdp.send('Performance.enable');
    const onIntervals: number[] = [];
    const work = { on: [] as Metrics[], off: [] as Metrics[] };
    // Towards the middle of the view, so the drag never reaches the edge where the canvas auto-pans.
    let direction = { x: target.x < cx ? 1 : -1, y: target.y < cy ? 1 : -1 };
    let pos = target;
    const grabbed = (await page.evaluate(
      `document.elementFromPoint(${pos.x}, ${pos.y})?.closest('.react-flow__node')?.getAttribute('data-id') ?? null`,
    )) as string | null;
    if (!grabbed) throw new Error(`no node under the pointer at ${pos.x}, ${pos.y}`);
    for (let round = 0; round < (WARMUP_PAIRS + ROUNDS) * 2; round++) {
      const overlays = round % 2 === 0;
      const timed = round >= WARMUP_PAIRS * 2;
      const labelsOff = page.getByTestId('labels-off');
      if ((await labelsOff.getAttribute('aria-pressed')) === String(overlays)) await labelsOff.click();
      await page.waitForTimeout(200);
      if (process.env.BENCH_SHOTS)
        await page.screenshot({ path: join(process.cwd(), 'test-artifacts', `bench-round${round}.png`) });
      const rect = (await page.evaluate(
        `(() => { const r = document.querySelector('.react-flow__node[data-id="${grabbed}"]').getBoundingClientRect(); return { x: r.left + 12, y: r.top + r.height / 2 }; })()`,
      )) as { x: number; y: number };
      pos = rect;
      const where = () =>
        page.evaluate(
          `document.querySelector('.react-flow__node[data-id="${grabbed}"]')?.style.transform ?? ''`,
        );
      const from = await where();
      const before = await readMetrics(cdp);
      const intervals = await drag(page, pos.x, pos.y, direction);
      const after = await readMetrics(cdp);
      if ((await where()) === from) throw new Error(`round ${round}: node ${grabbed} did not move`);
      const perFrame = {} as Metrics;
      for (const k of METRICS) perFrame[k] = ((after[k] - before[k]) * 1000) / FRAMES;
      if (timed) {
        (overlays ? work.on : work.off).push(perFrame);
        if (overlays) onIntervals.push(...intervals);
      }
      direction = { x: -direction.x, y: -direction.y };
      await page.waitForTimeout(200);
    }
    const undoSteps = await page.getByTestId('undo').isEnabled();
    await context.close();
    if (errors.length > 0) throw new Error(`page errors during the editor bench: ${errors.join('; ')}`);
    if (!undoSteps) throw new Error('the drag did not reach the document (no undo step)');
    const mid = (xs: Metrics[]) => {
      const out = {} as Metrics;
      for (const k of METRICS)
        out[k] = quantile(
          xs.map((x) => x[k]),
          0.5,
        );
      return out;
    };
    const on = mid(work.on);
    const off = mid(work.off);
    // Each round with labels on against the round with them off that follows it: the median of
    // these paired ratios, so a slow spell on the machine weighs on both halves of a pair.
    const pairs = work.on.map((x, k) => x.TaskDuration / (work.off[k] as Metrics).TaskDuration);
    return {
      elements: doc.nodes.length + doc.cables.length,
      medianMs: quantile(onIntervals, 0.5),
      p95Ms: quantile(onIntervals, 0.95),
      overlayRatio: quantile(pairs, 0.5),
      overlayRatioOfMedians: on.TaskDuration / off.TaskDuration,
      workPerFrameMs: { overlaysOn: on, overlaysOff: off },
      rendered: { nodes: visibleNodes, edges: visibleEdges },
      frames: FRAMES,
      rounds: ROUNDS,
      warmupPairs: WARMUP_PAIRS,
      targets: { p95Ms: 20, overlayRatio: 1.3 },
    };
  } finally {
    server.kill();
    rmSync(dir, { recursive: true, force: true });
  }
}

const isMain = process.argv[1]?.endsWith('bench/editor.ts');
if (isMain) {
  runEditorBench().then(
    (r) => console.log(JSON.stringify(r)),
    (e) => {
      console.error(e);
      process.exit(1);
    },
  );
}
