import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { cpSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';

/** How the fake registry answers: the package, a 404 for everything, or a tarball cut off halfway. */
export type RegistryMode = 'serve' | 'not-found' | 'die-mid-tarball';

export interface FakeNpmRegistry {
  url: string;
  /** The paths asked for, in order (a cached install asks for none). */
  requests: string[];
  mode: RegistryMode;
  /** The packed tarball it serves, for tests that install it as a local .tgz too. */
  tarball: string;
  close(): Promise<void>;
}

/**
 * A registry of one package version on 127.0.0.1, enough for `npm install`: the packument (the
 * version's package.json with `dist.tarball` and `dist.integrity`) and the tarball, packed as
 * `npm pack` lays it out (everything under `package/`) from the copy installed in this project's
 * node_modules (the real release, e.g. node_modules/complex.js-2.3.0). Tests never reach the real
 * registry; point npm here with `npm_config_registry`.
 */
export async function fakeNpmRegistry(installedFolder: string): Promise<FakeNpmRegistry> {
  const work = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-registry-'));
  cpSync(installedFolder, path.join(work, 'package'), { recursive: true });
  const manifest = JSON.parse(readFileSync(path.join(work, 'package', 'package.json'), 'utf8')) as {
    name: string;
    version: string;
  };
  const tarball = path.join(work, `${manifest.name}-${manifest.version}.tgz`);
  execFileSync('tar', ['-czf', tarball, '-C', work, 'package']);
  const bytes = readFileSync(tarball);
  const integrity = `sha512-${createHash('sha512').update(bytes).digest('base64')}`;
  const shasum = createHash('sha1').update(bytes).digest('hex');
  const tarballPath = `/${manifest.name}/-/${path.basename(tarball)}`;
  const registry: FakeNpmRegistry = {
    url: '',
    requests: [],
    mode: 'serve',
    tarball,
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      rmSync(work, { recursive: true, force: true });
    },
  };
  const server = http.createServer((req, res) => {
    const url = decodeURIComponent(req.url ?? '');
    registry.requests.push(url);
    if (registry.mode === 'not-found') {
      res.writeHead(404, { 'content-type': 'application/json' }).end('{"error":"Not found"}');
    } else if (url === `/${manifest.name}`) {
      const version = { ...manifest, dist: { tarball: `${registry.url}${tarballPath}`, integrity, shasum } };
      res.writeHead(200, { 'content-type': 'application/json' }).end(
        JSON.stringify({
          name: manifest.name,
          'dist-tags': { latest: manifest.version },
          versions: { [manifest.version]: version },
        }),
      );
    } else if (url === tarballPath) {
      res.writeHead(200, { 'content-type': 'application/octet-stream', 'content-length': bytes.length });
      if (registry.mode === 'die-mid-tarball') {
        res.write(bytes.subarray(0, bytes.length >> 1));
        // The connection dies with half the promised bytes sent.
        setTimeout(() => res.socket?.destroy(), 20);
      } else res.end(bytes);
    } else {
      res.writeHead(404, { 'content-type': 'application/json' }).end('{"error":"Not found"}');
    }
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  registry.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return registry;
}
