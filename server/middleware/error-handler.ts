import type { NextFunction, Request, Response } from 'express';
import type { ApiError } from '../../shared/api-error';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { describeError } from '../database/describe-error';
import { isDatabaseUnavailable } from '../database/is-database-unavailable';

interface HttpishError {
  status?: number;
  type?: string;
  message?: string;
}

/** What a 503 for an unreachable database suggests; a restarted PostgreSQL accepts connections within seconds. */
const DATABASE_RETRY_AFTER_SECONDS = 5;

/**
 * Turns every thrown error into an ApiError body. Body-parser failures are the
 * client's (4xx); anything unknown is logged and answered 500 without details.
 */
export function errorHandler(err: unknown, _req: Request, res: Response, next: NextFunction): void {
  if (res.headersSent) {
    next(err);
    return;
  }
  const send = (status: number, body: ApiError) => void res.status(status).json(body);
  if (err instanceof InputError) return send(400, { kind: 'invalid-input', message: err.message, issues: err.issues });
  if (err instanceof HttpError) return send(err.status, err.body);
  const e = (err ?? {}) as HttpishError;
  switch (e.type) {
    case 'entity.parse.failed':
      return send(400, {
        kind: 'invalid-input',
        message: 'The body is not valid JSON.',
        issues: [{ field: 'body', rule: 'must be valid JSON' }],
      });
    case 'entity.too.large':
      return send(413, { kind: 'payload-too-large', message: 'The body is too large.' });
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return send(415, { kind: 'unsupported-media-type', message: e.message ?? 'Unsupported encoding.' });
    case 'request.aborted':
      return send(400, {
        kind: 'invalid-input',
        message: 'The request was aborted.',
        issues: [{ field: 'body', rule: 'must arrive complete' }],
      });
  }
  if (typeof e.status === 'number' && e.status >= 400 && e.status < 500) {
    return send(e.status, {
      kind: 'invalid-input',
      message: e.message ?? 'Bad request.',
      issues: [{ field: 'body', rule: e.message ?? 'is not acceptable' }],
    });
  }
  if (isDatabaseUnavailable(err)) {
    // Not the request's fault and not a bug: PostgreSQL is down or dropped the connection. The
    // pools open new connections on the next request, so the server serves again once it is back.
    res.set('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
    return send(503, {
      kind: 'unavailable',
      message: 'The database cannot be reached right now, so nothing was read or saved. Try again in a moment.',
    });
  }
  console.error('[sheetkeeper] unhandled error', describeError(err));
  send(500, { kind: 'server-error', message: 'Something went wrong on the server.' });
}
