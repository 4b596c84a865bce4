import type { ApiError } from '../shared/api-error';
import { ApiRequestError } from './api-request-error';

/**
 * Calls the API on the same origin with the session cookie. JSON (or a FormData upload) in, JSON out;
 * a non-2xx answer throws ApiRequestError carrying the server's ApiError.
 */
export async function apiFetch<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  // A FormData body (a file upload) goes as multipart: fetch sets the content type with its boundary.
  const form = typeof FormData !== 'undefined' && init.body instanceof FormData;
  const response = await fetch(`/api${path}`, {
    method: init.method ?? 'GET',
    credentials: 'same-origin',
    headers:
      init.body === undefined || form
        ? { accept: 'application/json' }
        : { accept: 'application/json', 'content-type': 'application/json' },
    body: init.body === undefined ? undefined : form ? (init.body as FormData) : JSON.stringify(init.body),
  });
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  const parsed: unknown = text ? safeJson(text) : undefined;
  if (!response.ok) {
    const body = (
      parsed && typeof parsed === 'object' && 'kind' in parsed
        ? parsed
        : { kind: 'server-error', message: `The server answered ${response.status}.` }
    ) as ApiError;
    throw new ApiRequestError(response.status, body);
  }
  return parsed as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
