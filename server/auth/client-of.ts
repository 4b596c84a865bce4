import type { Request } from 'express';

/** The client the sign-in limiter counts: the listener's peer, or the one a trusted proxy names (`trust proxy`, off by default). */
export function clientOf(req: Request): string {
  return req.ip ?? req.socket.remoteAddress ?? 'unknown';
}
