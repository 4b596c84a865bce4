import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { startTestApp, type TestApp } from '../setup/test-app';

describe('the app shell of the server', () => {
  let t: TestApp;
  let webDir: string;
  beforeAll(async () => {
    webDir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-web-'));
    writeFileSync(path.join(webDir, 'index.html'), '<!doctype html><div id="root">exported app</div>');
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
});
