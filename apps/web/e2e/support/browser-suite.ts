import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, expect } from 'vitest';
import { startApiServer, type ApiServer } from './api-server';
import { launchBrowser, type TestBrowser } from './browser';
import { signIn } from './sign-in';

/** Where browser tests leave their screenshots. */
export const shots = '/tmp/tw-shots';

/** The API and the browser of one `describe`, there once its `beforeAll` has run. */
export interface BrowserSuite {
  readonly api: ApiServer;
  readonly browser: TestBrowser;
  /** A fresh tab, signed in as `email` through the real form. */
  signedIn(email: string, password?: string): Promise<Page>;
}

export interface BrowserSuiteOptions {
  /** Runs before the API starts, e.g. to set the environment it and a worker will share. */
  beforeApiStart?: () => void;
  /** Runs once the API is up on its freshly seeded database, before the browser starts (extra records, a worker). */
  afterApiStart?: () => Promise<void> | void;
  /** Runs after the browser has closed, before the API stops. */
  beforeApiStop?: () => Promise<void> | void;
  /** How long the set-up may take, for suites that add records or start a worker. */
  setupTimeoutMs?: number;
}

/**
 * Registers in the calling `describe` the hooks every browser test shares: the screenshots folder, the real API
 * on a freshly seeded database (which waits for other browser-test runs), a headless chromium; after each test,
 * that the page raised no uncaught error or console error; at the end, the browser and the API stop.
 */
export function useBrowserSuite(options: BrowserSuiteOptions = {}): BrowserSuite {
  let api: ApiServer | undefined;
  let browser: TestBrowser | undefined;

  const suite: BrowserSuite = {
    get api() {
      if (!api) throw new Error('The API is not started: use it inside a test, after beforeAll');
      return api;
    },
    get browser() {
      if (!browser) throw new Error('The browser is not launched: use it inside a test, after beforeAll');
      return browser;
    },
    async signedIn(email, password) {
      const page = await suite.browser.freshPage();
      await signIn(page, suite.api.baseUrl, email, password);
      return page;
    },
  };

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    options.beforeApiStart?.();
    api = await startApiServer();
    await options.afterApiStart?.();
    browser = await launchBrowser();
  }, options.setupTimeoutMs);

  afterEach(() => {
    expect(suite.browser.problems).toEqual([]);
  });

  afterAll(async () => {
    await browser?.close();
    await options.beforeApiStop?.();
    await api?.stop();
  });

  return suite;
}
