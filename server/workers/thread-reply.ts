import type { ApiError, FieldIssue } from '../../shared/api-error';

/**
 * What a pool thread sends back for request `id` (serve-thread-requests.ts): a value, or an
 * error that keeps the status and body a service decided (HttpError, InputError).
 */
export type ThreadReply =
  | { id: number; ok: true; value: unknown }
  | {
      id: number;
      ok: false;
      failure:
        | { kind: 'http'; status: number; body: ApiError }
        | { kind: 'input'; issues: FieldIssue[] }
        | { kind: 'error'; message: string };
    };
