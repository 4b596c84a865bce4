/** One answer of the fake API: a status and a JSON body. */
export interface FakeAnswer {
  status: number;
  body?: unknown;
}

/**
 * Replaces global fetch with one that answers by "METHOD /path" (query string ignored); a
 * handler may look at the parsed JSON body, so one test can fake a server that judges input.
 * Unknown routes answer 404, and every call is recorded in order with its parsed body.
 */
export function fakeApiRoutes(routes: Record<string, FakeAnswer | ((body: unknown) => FakeAnswer)>) {
  const calls: { method: string; path: string; body: unknown }[] = [];
  global.fetch = jest.fn(async (url: string | URL | Request, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    const path = String(url).split('?')[0]!;
    const body = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
    calls.push({ method, path, body });
    const route = routes[`${method} ${path}`];
    const answer =
      typeof route === 'function'
        ? route(body)
        : (route ?? { status: 404, body: { kind: 'not-found', message: `No fake for ${method} ${path}` } });
    return {
      ok: answer.status >= 200 && answer.status < 300,
      status: answer.status,
      text: async () => (answer.status === 204 ? '' : JSON.stringify(answer.body)),
    } as Response;
  }) as typeof fetch;
  return calls;
}
