import type { Page } from 'playwright-core';

/** The API as the signed-in page sees it (same origin, session cookie): `{ status, body }` of one request. */
export function pageApi(page: Page) {
  return <T>(path: string, method = 'GET', body?: unknown): Promise<T> =>
    // Plain promise chains: the test's compiler may turn async/await and destructuring into helpers the page does not have.
    page.evaluate(
      (arg) =>
        fetch('/api' + arg.path, {
          method: arg.method,
          headers: arg.body ? { 'content-type': 'application/json' } : {},
          body: arg.body ? JSON.stringify(arg.body) : undefined,
        }).then((res) => res.json().then((json) => ({ status: res.status, body: json }))),
      { path, method, body },
    ) as Promise<T>;
}
