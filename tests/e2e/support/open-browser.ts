import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = process.env.SHEETKEEPER_E2E_URL ?? 'http://127.0.0.1:8461';

export interface OpenBrowser {
  context: BrowserContext;
  page: Page;
  /** Errors the page threw or logged; a journey that ends with any is a failure. */
  pageErrors: string[];
  close(): Promise<void>;
}

/**
 * Debian's Chromium through playwright-core, in a fresh profile. The flags keep it
 * off the network (this machine refuses outside connections) — see docs/conventions.md.
 */
export async function openBrowser(viewport = { width: 390, height: 844 }): Promise<OpenBrowser> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport,
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
  const page = context.pages()[0] ?? (await context.newPage());
  const pageErrors: string[] = [];
  page.on('pageerror', (error) => pageErrors.push(error.message));
  return {
    context,
    page,
    pageErrors,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
