import type { BrowserContext } from 'playwright-core';
import { BASE_URL, openBrowser, type OpenBrowser } from './open-browser';

/**
 * A new page for each test of the file, signed out with empty storage, closed after it; a test
 * whose page threw or logged an error fails. Returns a handle whose `page` is the current test's.
 *
 * The file's tests share one browser context, so the app's bundle is fetched and compiled once
 * per file rather than once per test (a fresh context has an empty HTTP and code cache); after
 * each test its cookies and the origin's storage are cleared, which is what a fresh profile
 * would give the next one.
 */
export function browserPerTest(): Pick<OpenBrowser, 'page' | 'context' | 'pageErrors'> {
  let file: OpenBrowser | null = null;
  let current: { context: BrowserContext; page: OpenBrowser['page']; pageErrors: string[] } | null = null;
  beforeEach(async () => {
    file ??= await openBrowser();
    const page = file.page.isClosed() ? await file.context.newPage() : file.page;
    const pageErrors: string[] = [];
    page.on('pageerror', (error) => pageErrors.push(error.message));
    current = { context: file.context, page, pageErrors };
  });
  afterEach(async () => {
    const errors = [...(current?.pageErrors ?? [])];
    const page = current?.page;
    current = null;
    if (page && !page.isClosed()) {
      // Storage is cleared from a page of the app's origin.
      if (!page.url().startsWith(BASE_URL)) await page.goto(`${BASE_URL}/sign-in`).catch(() => undefined);
      await page
        .evaluate(() => {
          window.localStorage.clear();
          window.sessionStorage.clear();
        })
        .catch(() => undefined);
      await page.close();
    }
    await file?.context.clearCookies();
    expect(errors).toEqual([]);
  });
  afterAll(async () => {
    await file?.close();
    file = null;
  });
  return {
    get page() {
      return current!.page;
    },
    get context() {
      return current!.context;
    },
    get pageErrors() {
      return current!.pageErrors;
    },
  };
}
