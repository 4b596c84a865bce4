import compression from 'compression';
import express, { Router } from 'express';
import path from 'node:path';
import { webCacheControl } from './web-cache-control';

/**
 * The exported Expo web app: compressed, hashed files cached for a year, the rest revalidated.
 *
 * Compression is done on the fly by the `compression` package (brotli at quality 4 where the
 * browser offers it, as Chromium does, else gzip at zlib level 6) rather than by files compressed
 * ahead of time. Measured on the 2-core machine (load average 16–19) on the 2,190,213-byte entry
 * bundle: gzip 6 gives 532,995 bytes in 59–69 ms, gzip 9 530,598 in 80–89 ms, brotli 4 513,109 in
 * 129–228 ms, brotli 11 416,010 in 8.9–13.2 s. Only brotli 11 would need a build step (or seconds
 * of start-up per build), for 97–117 KB less; zlib runs on libuv's thread pool, not the server's
 * thread, and a hashed file is fetched once per build and browser thanks to its year-long
 * `immutable` cache. API answers stay uncompressed: under the load bench the CPU, not the bytes,
 * was the limit (DEVELOPERS.md).
 */
export function webAppRouter(webDir: string): Router {
  const router = Router();
  router.use(compression());
  router.use(
    express.static(webDir, {
      index: 'index.html',
      cacheControl: false,
      setHeaders: (res, filePath) => res.setHeader('Cache-Control', webCacheControl(filePath)),
    }),
  );
  // A hashed file that is not there (a page of an older build asking for its bundle) is a 404,
  // never index.html under a script's name.
  router.use(['/_expo', '/assets'], (_req, res) => {
    res.status(404).setHeader('Cache-Control', 'no-cache').type('text').send('No such file in this build of the app.');
  });
  // Expo Router's single-page export: every other path is a client route.
  router.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(path.join(webDir, 'index.html'));
  });
  return router;
}
