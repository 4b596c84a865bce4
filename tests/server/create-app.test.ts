import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { startTestApp, type TestApp } from '../setup/test-app';

const BUNDLE = 'entry-6a55deadc538b7172962df549bd743da.js';
const FONT = 'marks.fd8d6c103a02f905a81931b4f2cc365c.ttf';
/** 200 KB of script-like text, as repetitive as a real bundle (2.19 MB gzips to 0.53 MB). */
const bundleText = Array.from({ length: 4000 }, (_, i) => `function f${i}(a){return a+${i % 97};}\n`).join('');

/** The bytes a client receives for `url` (before any decoding) and the answer's headers, over loopback. */
function fetchRaw(app: http.RequestListener, url: string, headers: Record<string, string>) {
  return new Promise<{ bytes: number; status: number; headers: http.IncomingHttpHeaders }>((resolve, reject) => {
    const server = http.createServer(app).listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      http
        .get({ host: '127.0.0.1', port, path: url, headers }, (res) => {
          let bytes = 0;
          res.on('data', (chunk: Buffer) => (bytes += chunk.length));
          res.on('end', () =>
            server.close(() => resolve({ bytes, status: res.statusCode ?? 0, headers: res.headers })),
          );
        })
        .on('error', reject);
    });
  });
}

describe('the app shell of the server', () => {
  let t: TestApp;
  let webDir: string;
  beforeAll(async () => {
    webDir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-web-'));
    writeFileSync(path.join(webDir, 'index.html'), '<!doctype html><div id="root">exported app</div>');
    mkdirSync(path.join(webDir, '_expo', 'static', 'js', 'web'), { recursive: true });
    writeFileSync(path.join(webDir, '_expo', 'static', 'js', 'web', BUNDLE), bundleText);
    mkdirSync(path.join(webDir, 'assets', 'fonts'), { recursive: true });
    writeFileSync(path.join(webDir, 'assets', 'fonts', FONT), Buffer.alloc(4096, 7));
    writeFileSync(path.join(webDir, 'metadata.json'), '{"version":0}');
    t = await startTestApp({ webDir });
  });
  afterAll(async () => {
    await t.stop();
    rmSync(webDir, { recursive: true, force: true });
  });

  it('sends helmet security headers with a content security policy', async () => {
    const res = await request(t.app).get('/api/me');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('keeps API answers out of caches', async () => {
    expect((await request(t.app).get('/api/me')).headers['cache-control']).toBe('no-store');
  });

  it('serves the exported app for client routes, but not for unknown API routes', async () => {
    const page = await request(t.app).get('/users');
    expect(page.status).toBe(200);
    expect(page.text).toContain('exported app');
    const api = await request(t.app).get('/api/users/x/y');
    expect(api.status).toBe(404);
    expect(api.body.kind).toBe('not-found');
  });

  it('sends the hashed bundle compressed to a browser that accepts it (brotli, else gzip), and whole to one that does not', async () => {
    const url = `/_expo/static/js/web/${BUNDLE}`;
    const brotli = await fetchRaw(t.app, url, { 'Accept-Encoding': 'gzip, deflate, br' });
    const gzipped = await fetchRaw(t.app, url, { 'Accept-Encoding': 'gzip, deflate' });
    const plain = await fetchRaw(t.app, url, { 'Accept-Encoding': 'identity' });
    expect([brotli.status, brotli.headers['content-encoding']]).toEqual([200, 'br']);
    expect([gzipped.status, gzipped.headers['content-encoding']]).toEqual([200, 'gzip']);
    expect(gzipped.headers.vary).toMatch(/Accept-Encoding/i);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.bytes).toBe(Buffer.byteLength(bundleText));
    expect(gzipped.bytes).toBeLessThan(plain.bytes / 4);
    expect(brotli.bytes).toBeLessThan(plain.bytes / 4);
  });

  it('keeps hashed files for a year without revalidation, and has the browser revalidate index.html and other names', async () => {
    const year = 'public, max-age=31536000, immutable';
    expect((await request(t.app).get(`/_expo/static/js/web/${BUNDLE}`)).headers['cache-control']).toBe(year);
    expect((await request(t.app).get(`/assets/fonts/${FONT}`)).headers['cache-control']).toBe(year);
    for (const url of ['/', '/index.html', '/metadata.json', '/runs/123']) {
      const res = await request(t.app).get(url);
      expect([url, res.status, res.headers['cache-control']]).toEqual([url, 200, 'no-cache']);
    }
  });

  it('answers a revalidation of index.html with 304 while it is unchanged', async () => {
    const first = await request(t.app).get('/index.html').set('Accept-Encoding', 'gzip');
    expect(first.headers.etag).toBeDefined();
    const again = await request(t.app)
      .get('/index.html')
      .set('Accept-Encoding', 'gzip')
      .set('If-None-Match', first.headers.etag!);
    expect(again.status).toBe(304);
  });

  it('answers 404 for a hashed file that is not in this build, never index.html under its name', async () => {
    const res = await request(t.app).get('/_expo/static/js/web/entry-00000000000000000000000000000000.js');
    expect(res.status).toBe(404);
    expect(res.text).not.toContain('exported app');
  });
});
