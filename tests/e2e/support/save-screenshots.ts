import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';

export const SCREEN_SIZES = [
  { width: 390, height: 844 },
  { width: 1440, height: 900 },
] as const;

const DIR = path.join(__dirname, '..', '..', '..', 'test-results');

/** Saves the current screen at the phone and the wide size: test-results/<name>-<w>x<h>.png. */
export async function saveScreenshots(page: Page, name: string, ready: () => Promise<unknown>): Promise<void> {
  mkdirSync(DIR, { recursive: true });
  const original = page.viewportSize();
  for (const size of SCREEN_SIZES) {
    await page.setViewportSize(size);
    await ready();
    await page.screenshot({ path: path.join(DIR, `${name}-${size.width}x${size.height}.png`), fullPage: true });
  }
  if (original) await page.setViewportSize(original);
}
