import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { CHROMIUM, CHROMIUM_ARGS as ARGS } from './host.ts';

export const ARTIFACTS = join(process.cwd(), 'test-artifacts');

export interface Session {
  context: BrowserContext;
  page: Page;
  /** Console errors and page errors seen so far; tests assert this stays empty. */
  errors: string[];
  close(): Promise<void>;
}

/** A fresh Chromium profile (so IndexedDB starts empty) with a page whose errors are collected. */
export async function openSession(viewport = { width: 1440, height: 900 }): Promise<Session> {
  const dir = mkdtempSync(join(tmpdir(), 'dropline-e2e-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM,
    headless: true,
    args: ARGS,
    viewport,
    acceptDownloads: true,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error') errors.push(msg.text());
  });
  page.on('pageerror', (err) => errors.push(String(err)));
  return {
    context,
    page,
    errors,
    async close() {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(ARTIFACTS, { recursive: true });
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`) });
}

/** The document text the editor last autosaved (IndexedDB "dropline", store "autosave"). */
export function readAutosave(page: Page): Promise<string> {
  return page.evaluate(
    () =>
      new Promise<string>((resolve, reject) => {
        const req = indexedDB.open('dropline', 1);
        req.onsuccess = () => {
          const get = req.result.transaction('autosave').objectStore('autosave').get('current');
          // No autosave yet fails at once instead of leaving the test to time out.
          get.onsuccess = () =>
            get.result
              ? resolve((get.result as { text: string }).text)
              : reject(new Error('no autosave yet: wait for the edit to be saved'));
          get.onerror = () => reject(get.error);
        };
        req.onerror = () => reject(req.error);
      }),
  );
}
