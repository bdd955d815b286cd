import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** Debian's chromium; playwright never downloads a browser here. */
const executablePath = '/usr/bin/chromium';
const chromiumArgs = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** One chromium with its own fresh profile folder. */
export interface TestBrowser {
  readonly context: BrowserContext;
  /** A new tab with no cookies left from earlier tests. */
  freshPage(): Promise<Page>;
  /**
   * Uncaught exceptions and console errors of the current tab since `freshPage()`, except the
   * browser's own "Failed to load resource" lines for answers the tests provoke (401, 404, 410).
   */
  readonly problems: string[];
  close(): Promise<void>;
}

/** Launches chromium headless with a fresh `--user-data-dir` for this run. */
export async function launchBrowser(): Promise<TestBrowser> {
  const userDataDir = mkdtempSync(join(tmpdir(), 'tw-e2e-chromium-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath,
    headless: true,
    args: chromiumArgs,
    viewport: { width: 1280, height: 800 },
  });
  context.setDefaultTimeout(15_000);
  const problems: string[] = [];
  return {
    context,
    problems,
    freshPage: async () => {
      for (const open of context.pages()) {
        await open.close();
      }
      await context.clearCookies();
      problems.length = 0;
      const page = await context.newPage();
      page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
      page.on('console', (message) => {
        if (message.type() === 'error' && !message.text().startsWith('Failed to load resource')) {
          problems.push(`console: ${message.text()}`);
        }
      });
      return page;
    },
    close: async () => {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}
