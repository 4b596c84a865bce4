import type { NextFunction, Request, Response } from 'express';
import type { ApiError } from '../../shared/api-error';
import { originOf } from '../http/origin-of';

/** Methods that never change data; every other method is checked. */
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses a request that changes data when a browser says it comes from a page of another origin.
 * SameSite=Lax does not help here: another port on the same host is the same site, so its page's
 * form posts and no-cors fetches carry our session cookie.
 *
 * The rule, in order:
 * - GET, HEAD and OPTIONS pass (they change nothing).
 * - A bearer token passes: a page cannot attach one without a CORS preflight, which this server
 *   never answers, and a bad token gets 401 from `tokenAuth` (it never falls back to the cookie).
 * - `Origin` is compared with `allowed`; when it is missing, the origin of `Referer` is.
 *   `Origin: null` (sandboxed frames, data: pages) and an unreadable `Referer` are foreign.
 * - Neither header: the request passes. Browsers send `Origin` on every cross-origin POST, PUT,
 *   PATCH and DELETE (and on same-origin ones too, except old ones on same-origin POST), so a
 *   request with neither comes from a program (the CLI, curl, a test), not from a page the
 *   user's browser was steered to.
 */
export function sameOriginGuard(allowed: readonly string[]) {
  // Read at each request: a server on an OS-chosen port (SHEETKEEPER_PORT=0) learns its own
  // origins only once it listens (server/main.ts adds them to this list then).
  return (req: Request, res: Response, next: NextFunction): void => {
    if (SAFE_METHODS.has(req.method)) return next();
    if (/^Bearer\s/i.test(req.get('authorization') ?? '')) return next();
    const origin = req.get('origin');
    const referer = req.get('referer');
    if (origin === undefined && referer === undefined) return next();
    const claimed = origin !== undefined ? origin : originOf(referer!);
    const own = new Set(allowed.map((o) => originOf(o) ?? o));
    if (claimed !== null && own.has(claimed)) return next();
    // Headers reach 16 KB; the answer quotes only enough to recognise the page.
    const from = (origin !== undefined ? `Origin ${origin}` : `Referer ${referer}`).slice(0, 200);
    res.status(403).json({
      kind: 'forbidden',
      message:
        `Refused: this request came from a page outside Sheetkeeper (${from}). ` +
        `Changes are accepted only from Sheetkeeper's own pages (${[...own].join(', ')}) or with an API token. ` +
        'If Sheetkeeper is served at another address, add it to SHEETKEEPER_ORIGINS.',
    } satisfies ApiError);
  };
}
