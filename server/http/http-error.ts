import type { ApiError } from '../../shared/api-error';

/** An answer a service decides (404, 403, 409…), thrown so routes stay straight-line; the error handler sends it. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly body: ApiError,
  ) {
    super(body.message);
  }
}
