import type { Response } from 'express';
import type { ApiError } from '../../shared/api-error';

/** Answers 429 with `Retry-After`: `what` says what was tried too often, then how long to wait. */
export function sendTooManyAttempts(res: Response, wait: number, what: string): void {
  res.set('Retry-After', String(wait));
  res.status(429).json({
    kind: 'too-many-attempts',
    message: `${what} Try again in ${wait < 60 ? `${wait} s` : `${Math.ceil(wait / 60)} min`}.`,
    retryAfterSeconds: wait,
  } satisfies ApiError);
}
