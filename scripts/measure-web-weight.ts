/**
 * `node --import tsx scripts/measure-web-weight.ts <exported web dir>`: serves an `expo export`
 * output on 127.0.0.1 as the server does (server/http/web-app-router.ts) and, for each script of
 * the export and index.html, prints the bytes a browser receives uncompressed, with gzip and with
 * brotli, the time each took, and the Cache-Control it was given. The figures in
 * docs/review-and-weight.md come from it.
 */
import express from 'express';
import { readdirSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { webAppRouter } from '../server/http/web-app-router';

const dir = process.argv[2];
if (!dir) throw new Error('usage: measure-web-weight.ts <exported web dir>');

const scripts = readdirSync(path.join(dir, '_expo', 'static', 'js', 'web')).map((f) => `/_expo/static/js/web/${f}`);
const app = express().use(webAppRouter(dir));
const server = app.listen(0, '127.0.0.1', async () => {
  const { port } = server.address() as AddressInfo;
  const get = (url: string, encoding: string) =>
    new Promise<{ bytes: number; ms: number; cache: string; encoding: string }>((resolve, reject) => {
      const started = performance.now();
      http
        .get({ host: '127.0.0.1', port, path: url, headers: { 'Accept-Encoding': encoding } }, (res) => {
          let bytes = 0;
          res.on('data', (c: Buffer) => (bytes += c.length));
          res.on('end', () =>
            resolve({
              bytes,
              ms: Math.round(performance.now() - started),
              cache: String(res.headers['cache-control']),
              encoding: String(res.headers['content-encoding'] ?? 'identity'),
            }),
          );
        })
        .on('error', reject);
    });
  let total = { identity: 0, gzip: 0, br: 0 };
  for (const url of [...scripts, '/index.html']) {
    const identity = await get(url, 'identity');
    const gzip = await get(url, 'gzip, deflate');
    const br = await get(url, 'gzip, deflate, br');
    total = { identity: total.identity + identity.bytes, gzip: total.gzip + gzip.bytes, br: total.br + br.bytes };
    console.log(
      `${url}\n  identity ${identity.bytes} B · gzip ${gzip.bytes} B in ${gzip.ms} ms · ${br.encoding} ${br.bytes} B in ${br.ms} ms · Cache-Control: ${identity.cache}`,
    );
  }
  console.log(`total: identity ${total.identity} B, gzip ${total.gzip} B, brotli ${total.br} B`);
  server.close();
});
