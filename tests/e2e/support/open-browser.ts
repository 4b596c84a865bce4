import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = process.env.SHEETKEEPER_E2E_URL ?? 'http://127.0.0.1:8461';

export interface OpenBrowser {
  context: BrowserContext;
  page: Page;
  /** Errors the page threw or logged; a journey that ends with any is a failure. */
  pageErrors: string[];
  close(): Promise<void>;
}

let shared: Promise<Browser> | null = null;

/** The test file's one Chromium, started on first use (tests/e2e/support/close-browser-after-file.ts ends it). */
function sharedBrowser(): Promise<Browser> {
  shared ??= chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return shared;
}

/**
 * Ends the test file's Chromium, if it started one. A close that fails is reported, not thrown: it
 * runs after every test of the file has ended, with nothing left to check, and a throw there fails
 * the whole file as "Test suite failed to run". playwright-core ends the browsers it launched when
 * the process exits, so a failed close leaves no Chromium behind.
 */
export async function closeSharedBrowser(): Promise<void> {
  const browser = shared;
  shared = null;
  if (!browser) return;
  try {
    await (await browser).close();
  } catch (reason) {
    console.warn(`Chromium did not close cleanly: ${JSON.stringify(String(reason))}`);
  }
}

/**
 * A fresh browser context (its own cookies, storage and cache, like a new profile) in Debian's
 * Chromium through playwright-core. One Chromium serves a test file: starting one per test was
 * 26 launches for the e2e run. The flags keep it off the network (this machine refuses outside
 * connections) — see docs/conventions.md.
 */
export async function openBrowser(viewport = { width: 390, height: 844 }): Promise<OpenBrowser> {
  const context = await (await sharedBrowser()).newContext({ viewport });
  const page = await context.newPage();
  const pageErrors: string[] = [];
  page.on('pageerror', (error) => pageErrors.push(error.message));
  return {
    context,
    page,
    pageErrors,
    close: () => context.close(),
  };
}
