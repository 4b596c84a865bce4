import { ApiRequestError } from './api-request-error';

/**
 * What to tell a person after a request went wrong: the API's own words when it answered with a
 * refusal, `unreachable` when it did not answer at all, nothing when nothing went wrong.
 */
export function refusalMessage(error: unknown, unreachable: string): string | null {
  if (error instanceof ApiRequestError) return error.body.message;
  return error ? unreachable : null;
}
