/**
 * Replaces global fetch with one that answers `status` and `body`, and records the
 * calls. jsdom has no Response class, so the answer carries only what apiFetch reads.
 */
export function mockFetch(status: number, body: unknown) {
  const calls: { url: string; init: RequestInit }[] = [];
  global.fetch = jest.fn(async (url: string | URL | Request, init?: RequestInit) => {
    calls.push({ url: String(url), init: init ?? {} });
    return {
      ok: status >= 200 && status < 300,
      status,
      text: async () => (status === 204 ? '' : JSON.stringify(body)),
    } as Response;
  }) as typeof fetch;
  return calls;
}
