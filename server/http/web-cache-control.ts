/**
 * A file name with a content hash that Expo's web export writes: `entry-<32 hex>.js` under
 * `_expo/static/`, `name.<32 hex>.ttf` (or `@2x.png`) under `assets/`. Its bytes never change
 * under that name, so it may be kept for a year; a new build brings new names.
 */
const HASHED = /[.-][0-9a-f]{32}(@\d+(\.\d+)?x)?\.[a-z0-9]+$/i;

/**
 * The Cache-Control of a file of the exported web app: a year and `immutable` (no revalidation
 * on reload) for a hashed name; `no-cache` for index.html and every other name, so the browser
 * revalidates it (ETag/Last-Modified, a 304 of a few hundred bytes) and a new build is seen at once.
 */
export function webCacheControl(filePath: string): string {
  return HASHED.test(filePath) ? 'public, max-age=31536000, immutable' : 'no-cache';
}
