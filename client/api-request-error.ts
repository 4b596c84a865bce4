import type { ApiError } from '../shared/api-error';

/** A non-2xx answer from the API, with its parsed ApiError body. */
export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    readonly body: ApiError,
  ) {
    super(body.message);
  }
}
