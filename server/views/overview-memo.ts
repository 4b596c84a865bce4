import type { RequestHandler } from 'express';
import { ShortLivedCache } from '../auth/short-lived-cache';

/**
 * How long a process shares the parts of the Overview that are the same for everyone
 * (load-overview.ts). The screen refreshes every few seconds; with this, 50 clients cost about
 * one computation of those parts a second instead of one per request.
 */
const OVERVIEW_SHARED_MS = 1000;

/**
 * The Overview's shared parts, one computation at a time for OVERVIEW_SHARED_MS. Any change
 * made through this process (a request that is not a GET) forgets them when it has answered,
 * so it shows at once; a run finished by another process shows within the second.
 */
export class OverviewMemo {
  private readonly entries = new ShortLivedCache<Promise<unknown>>(OVERVIEW_SHARED_MS, 1000);

  shared<T>(key: string, compute: () => Promise<T>): Promise<T> {
    const known = this.entries.get(key) as Promise<T> | undefined;
    if (known) return known;
    const pending = compute();
    this.entries.set(key, pending);
    pending.catch(() => this.entries.delete(key));
    return pending;
  }

  /** Middleware for the API: forgets everything once a request that may have changed something has answered. */
  readonly forgetOnWrite: RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') res.on('finish', () => this.entries.clear());
    next();
  };
}
