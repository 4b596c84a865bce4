/**
 * Replaces global fetch with one that answers each request from `answer(url, method)`, and
 * records the calls: for screens that read several API routes.
 */
export function mockFetchRoutes(answer: (url: string, method: string) => { status?: number; body: unknown }) {
  const calls: { url: string; init: RequestInit }[] = [];
  global.fetch = jest.fn(async (url: string | URL | Request, init?: RequestInit) => {
    calls.push({ url: String(url), init: init ?? {} });
    const { status = 200, body } = answer(String(url), init?.method ?? 'GET');
    return {
      ok: status >= 200 && status < 300,
      status,
      text: async () => (status === 204 ? '' : JSON.stringify(body)),
    } as Response;
  }) as typeof fetch;
  return calls;
}
