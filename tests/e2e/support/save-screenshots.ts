import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';

export const SCREEN_SIZES = [
  { width: 390, height: 844 },
  { width: 1440, height: 900 },
] as const;

const DIR = path.join(__dirname, '..', '..', '..', 'test-results');

/** The most a screen grows for its picture, so one endless list cannot make a giant file. */
const MAX_EXTRA_HEIGHT = 5000;

/**
 * Resizes the window and waits two frames: crossing the wide breakpoint swaps the app's frame,
 * which mounts the screen again, and an element found before that swap is detached under the
 * caller (seen once in four runs: "Element is not attached to the DOM" on the suite preview).
 */
async function resize(page: Page, size: { width: number; height: number }): Promise<void> {
  await page.setViewportSize(size);
  await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));
}

/**
 * Saves the current screen at the phone and the wide size: test-results/<name>-<w>x<h>.jpg.
 * JPEG at quality 85 rather than PNG: Chromium's PNG encoder spent ~12 s of CPU on the run's 78
 * pictures (144 megapixels, the tall ones up to 1440 × 5900), measured as the whole e2e run's CPU
 * with PNG, JPEG and no pictures; the pictures are for people to look at, and text stays legible.
 * The app scrolls inside its own frame (a ScrollView), so a full-page shot alone would show
 * only the first screenful: the window is made taller by what the frame hides, the whole
 * screen is taken, and the window goes back to its size.
 */
export async function saveScreenshots(page: Page, name: string, ready: () => Promise<unknown>): Promise<void> {
  mkdirSync(DIR, { recursive: true });
  const original = page.viewportSize();
  for (const size of SCREEN_SIZES) {
    await resize(page, size);
    await ready();
    const hidden = await page.evaluate(() =>
      Math.max(
        0,
        ...Array.from(document.querySelectorAll('div'))
          .filter((el) => /auto|scroll/.test(getComputedStyle(el).overflowY) && el.clientHeight > 200)
          .map((el) => el.scrollHeight - el.clientHeight),
      ),
    );
    if (hidden > 0) {
      await resize(page, { width: size.width, height: size.height + Math.min(hidden, MAX_EXTRA_HEIGHT) });
      await ready();
    }
    await page.screenshot({
      path: path.join(DIR, `${name}-${size.width}x${size.height}.jpg`),
      fullPage: true,
      type: 'jpeg',
      quality: 85,
    });
  }
  // Back to the caller's size the same way, and settled: going back from wide to a phone crosses the
  // breakpoint too, and a field filled before the frame swap finished was filled in the old frame
  // (seen once in five clean-clone runs: day-review-weight's "Path 1 radius" kept -1 after fill('1')).
  if (original) {
    await resize(page, original);
    await ready();
  }
}
