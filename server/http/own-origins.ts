import { originOf } from './origin-of';

/**
 * The origins whose pages may change data through the API (the same-origin guard's list).
 * `SHEETKEEPER_ORIGINS` (comma-separated) replaces the default, which is the app URL and the
 * server's own address under each loopback name: a browser on this machine may open the app
 * as 127.0.0.1, localhost or [::1], and each is a different origin to it.
 */
export function ownOrigins(appUrl: string, port: number, configured: string | undefined): string[] {
  if (configured !== undefined && configured.trim() !== '') {
    return configured
      .split(',')
      .map((s) => s.trim())
      .filter((s) => s !== '')
      .map((s) => {
        const origin = originOf(s);
        if (!origin) throw new Error(`SHEETKEEPER_ORIGINS has an entry that is not an http(s) URL: ${s}`);
        return origin;
      });
  }
  const origins = [originOf(appUrl), ...['127.0.0.1', 'localhost', '[::1]'].map((h) => `http://${h}:${port}`)];
  return [...new Set(origins.filter((o): o is string => o !== null))];
}
