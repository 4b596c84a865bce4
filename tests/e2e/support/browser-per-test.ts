import { openBrowser, type OpenBrowser } from './open-browser';

/**
 * A fresh Chromium profile for each test of the file, closed after it; a test whose page threw
 * or logged an error fails. Returns a handle whose `page` is the current test's.
 */
export function browserPerTest(): Pick<OpenBrowser, 'page' | 'context' | 'pageErrors'> {
  let current: OpenBrowser | null = null;
  beforeEach(async () => {
    current = await openBrowser();
  });
  afterEach(async () => {
    const errors = [...(current?.pageErrors ?? [])];
    await current?.close();
    current = null;
    expect(errors).toEqual([]);
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
