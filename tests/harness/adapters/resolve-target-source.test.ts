import { cpSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { resolveTargetSource } from '../../../harness/adapters/resolve-target-source';
import type { Target } from '../../../harness/adapters/target';
import type { TargetDescriptor } from '../../../harness/adapters/target-descriptor';
import { buildPlan } from '../../../harness/runner/plan/build-plan';
import { runPlan } from '../../../harness/runner/plan/run-plan';
import { seededReferenceCache } from '../../setup/seeded-reference-cache';
import { fakeNpmRegistry, type FakeNpmRegistry } from '../support/fake-npm-registry';
import { loadDemoSuite } from '../runner/support/load-demo-suite';

const ROOT = path.join(__dirname, '..', '..', '..');
/** The real complex.js 2.3.0 release, installed in this project under an alias; the fake registry serves it. */
const COMPLEX_JS_2_3_0 = path.join(ROOT, 'node_modules', 'complex.js-2.3.0');
/** Python's cmath adapter, run as a program source from the package root. */
const CMATH_SCRIPT = 'harness/adapters/python/cmath_adapter.py';
/** npm starts in ~0.5–1 s here and installs this package in ~1–2 s; a loaded machine takes several times that. */
const NPM_SLOW = 60_000;

let registry: FakeNpmRegistry;
let dir: string;
const saved = { ...process.env };
/** A fresh folder under this file's temporary folder. */
const fresh = (name: string): string => mkdtempSync(path.join(dir, `${name}-`));
/** npm with its own empty cache, so nothing a previous test fetched answers for the registry. */
function freshNpmCache(): void {
  process.env.npm_config_cache = fresh('npm-cache');
}

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-sources-'));
  registry = await fakeNpmRegistry(COMPLEX_JS_2_3_0);
  process.env.npm_config_registry = `${registry.url}/`;
  // One try, no waiting between tries: the failure tests would otherwise wait npm's 10 s back-off.
  process.env.npm_config_fetch_retries = '0';
  process.env.npm_config_update_notifier = 'false';
  process.env.npm_config_userconfig = path.join(dir, 'no-npmrc');
});
afterAll(async () => {
  process.env = saved;
  await registry.close();
  rmSync(dir, { recursive: true, force: true });
});
beforeEach(() => {
  registry.mode = 'serve';
  registry.requests.length = 0;
  freshNpmCache();
});

/** sqrt(−4 − 0i) through a target, closing it after. */
async function sqrtMinusFour(target: Target): Promise<unknown> {
  try {
    return (await target.evaluate('sqrt', [[[-4, -0]]]))[0];
  } finally {
    await target.close();
  }
}
const installed230 = (): TargetDescriptor => discoverTargets().find((t) => t.name === 'complex.js@2.3.0')!;
/** Folders a failed or finished install must not leave beside the cache entries. */
const partials = (folder: string): string[] =>
  existsSync(folder) ? readdirSync(folder).filter((f) => f.includes('.partial-')) : [];

describe('resolveTargetSource', () => {
  it(
    'installs an npm version on demand into the cache, and a second resolution uses the cache without asking the registry',
    async () => {
      const cacheDir = fresh('cache');
      const source = {
        kind: 'npm',
        package: 'complex.js',
        version: '2.3.0',
        name: 'complex.js@2.3.0-from-npm',
      } as const;
      const [target, ...others] = await resolveTargetSource(source, { baseDir: dir, cacheDir });
      expect(others).toEqual([]);
      expect(target!.name).toBe('complex.js@2.3.0-from-npm');
      expect(target!.settings).toEqual({ source: 'npm', package: 'complex.js@2.3.0' });
      expect(registry.requests).toEqual(['/complex.js', '/complex.js/-/complex.js-2.3.0.tgz']);
      const installedFile = path.join(
        cacheDir,
        'npm',
        'complex.js@2.3.0',
        'node_modules',
        'complex.js',
        'package.json',
      );
      expect(JSON.parse(readFileSync(installedFile, 'utf8')).version).toBe('2.3.0');
      // The same release as the project's alias, so the same value, wrong or right: 2.3.0 answers
      // +2i where ISO/IEC 9899:2011 G.6.4.2 (csqrt(conj z) = conj csqrt z) wants −2i.
      expect(await sqrtMinusFour(target!.open())).toEqual(await sqrtMinusFour(installed230().open()));
      registry.requests.length = 0;
      const again = await resolveTargetSource(source, { baseDir: dir, cacheDir });
      expect(again.map((t) => t.name)).toEqual(['complex.js@2.3.0-from-npm']);
      expect(registry.requests).toEqual([]);
      expect(partials(path.join(cacheDir, 'npm'))).toEqual([]);
    },
    NPM_SLOW,
  );

  it('answers an npm version installed with Sheetkeeper by the installed target, asking the registry nothing', async () => {
    const cacheDir = fresh('cache');
    const found = await resolveTargetSource(
      { kind: 'npm', package: 'complex.js', version: '2.3.0' },
      { baseDir: dir, cacheDir },
    );
    expect(found.map((t) => [t.name, t.settings])).toEqual([['complex.js@2.3.0', { package: 'complex.js-2.3.0' }]]);
    expect(registry.requests).toEqual([]);
    expect(existsSync(path.join(cacheDir, 'npm'))).toBe(false);
  });

  it(
    'ends two concurrent installers of one version (two copies of the module, two npm processes) with one complete copy and no error',
    async () => {
      const cacheDir = fresh('cache');
      const folder = path.join(cacheDir, 'npm', 'complex.js@2.3.0');
      // Two module instances do not share the in-process table of installs under way, as two
      // processes on one machine would not: each runs its own npm into its own temporary folder.
      const installers: ((what: string, into: string) => Promise<void>)[] = [];
      for (let i = 0; i < 2; i++)
        jest.isolateModules(() => {
          installers.push(require('../../../harness/sources/install-into-cache').installIntoCache);
        });
      await Promise.all(installers.map((install) => install('complex.js@2.3.0', folder)));
      expect(readdirSync(path.join(cacheDir, 'npm'))).toEqual(['complex.js@2.3.0']);
      const manifest = path.join(folder, 'node_modules', 'complex.js', 'package.json');
      expect(JSON.parse(readFileSync(manifest, 'utf8')).version).toBe('2.3.0');
      // Both npm processes fetched the packument: neither waited for the other.
      expect(registry.requests.filter((r) => r === '/complex.js').length).toBe(2);
    },
    NPM_SLOW,
  );

  it.each([
    ['answers 404', 'not-found', '/complex.js', /^npm install complex\.js@2\.3\.0 failed: code E404; 404 Not Found/],
    [
      'dies halfway through the tarball',
      'die-mid-tarball',
      '/complex.js/-/complex.js-2.3.0.tgz',
      /^npm install complex\.js@2\.3\.0 failed: code ECONNRESET/,
    ],
  ] as const)(
    'leaves nothing in the cache and gives npm’s reason when the registry %s',
    async (_, mode, lastRequest, reason) => {
      const cacheDir = fresh('cache');
      registry.mode = mode;
      await expect(
        resolveTargetSource(
          { kind: 'npm', package: 'complex.js', version: '2.3.0', name: 'x' },
          { baseDir: dir, cacheDir },
        ),
      ).rejects.toThrow(reason);
      expect(registry.requests.at(-1)).toBe(lastRequest);
      expect(readdirSync(path.join(cacheDir, 'npm'))).toEqual([]);
    },
    NPM_SLOW,
  );

  it('refuses an npm package it has no adapter for, naming it and suggesting a program source, before asking the registry', async () => {
    await expect(
      resolveTargetSource({ kind: 'npm', package: 'decimal.js', version: '10.6.0' }, { baseDir: dir, cacheDir: dir }),
    ).rejects.toThrow(
      /^the package "decimal\.js", which has no adapter in the harness \(it has complex\.js and mathjs\); check any other library as a program source/,
    );
    expect(registry.requests).toEqual([]);
  });

  it('loads a local folder where it is, so an edit to its package.json shows on the next resolution', async () => {
    const work = path.join(fresh('work'), 'complex.js');
    cpSync(COMPLEX_JS_2_3_0, work, { recursive: true });
    const options = { baseDir: path.dirname(work), cacheDir: fresh('cache') };
    const [first] = await resolveTargetSource({ kind: 'local', path: 'complex.js' }, options);
    // 2.3.0 is also installed with Sheetkeeper, so the working copy is told apart.
    expect(first!.name).toBe('complex.js@2.3.0+local');
    expect(first!.settings).toEqual({ source: 'local', path: work });
    expect(await sqrtMinusFour(first!.open())).toEqual(await sqrtMinusFour(installed230().open()));
    const manifest = JSON.parse(readFileSync(path.join(work, 'package.json'), 'utf8'));
    writeFileSync(path.join(work, 'package.json'), JSON.stringify({ ...manifest, version: '2.3.1-dev.1' }));
    const [edited] = await resolveTargetSource({ kind: 'local', path: 'complex.js' }, options);
    expect(edited!.name).toBe('complex.js@2.3.1-dev.1');
    const [named] = await resolveTargetSource({ kind: 'local', path: work, name: 'my-branch' }, options);
    expect(named!.name).toBe('my-branch');
    expect(readdirSync(options.cacheDir)).toEqual([]);
  });

  it('refuses a working copy whose build output is missing, before any run', async () => {
    const work = path.join(fresh('unbuilt'), 'complex.js');
    cpSync(COMPLEX_JS_2_3_0, work, { recursive: true });
    rmSync(path.join(work, 'dist'), { recursive: true });
    await expect(
      resolveTargetSource({ kind: 'local', path: work }, { baseDir: dir, cacheDir: fresh('cache') }),
    ).rejects.toThrow(
      /complex\.js: Node finds no file to load for complex\.js 2\.3\.0 \(.*\); is the library built\?$/,
    );
  });

  it(
    'installs a packed .tgz into the cache under its content hash and loads it from there',
    async () => {
      const cacheDir = fresh('cache');
      const [target] = await resolveTargetSource({ kind: 'local', path: registry.tarball }, { baseDir: dir, cacheDir });
      expect(target!.name).toBe('complex.js@2.3.0+local');
      const hash = String(target!.settings.sha256);
      expect(hash).toMatch(/^[0-9a-f]{32}$/);
      expect(readdirSync(path.join(cacheDir, 'tarballs'))).toEqual([hash]);
      expect(await sqrtMinusFour(target!.open())).toEqual(await sqrtMinusFour(installed230().open()));
      expect(registry.requests).toEqual([]);
    },
    NPM_SLOW,
  );

  it('refuses a local folder or tarball of a package it has no adapter for, and a path that is neither', async () => {
    const options = { baseDir: ROOT, cacheDir: fresh('cache') };
    await expect(resolveTargetSource({ kind: 'local', path: 'node_modules/decimal.js' }, options)).rejects.toThrow(
      /node_modules\/decimal\.js holds the package "decimal\.js", which has no adapter in the harness.*program source/,
    );
    await expect(resolveTargetSource({ kind: 'local', path: 'no/such/folder' }, options)).rejects.toThrow(
      /no\/such\/folder does not exist/,
    );
    await expect(resolveTargetSource({ kind: 'local', path: 'package.json' }, options)).rejects.toThrow(
      /neither a folder nor a packed \.tgz/,
    );
    const notATarball = path.join(fresh('bad'), 'x.tgz');
    writeFileSync(notATarball, 'not gzip');
    await expect(resolveTargetSource({ kind: 'local', path: notATarball }, options)).rejects.toThrow(
      /is not a packed npm package/,
    );
    expect(readdirSync(options.cacheDir)).toEqual([]);
  });

  it('describes a program source, opens it in process and again from its worker spec alone', async () => {
    const [target, ...others] = await resolveTargetSource(
      { kind: 'program', command: ['/usr/bin/python3', CMATH_SCRIPT] },
      { baseDir: ROOT, cacheDir: dir },
    );
    expect(others).toEqual([]);
    // The name it describes, even where an installed target has it: the caller asks for a `name` then.
    expect(target!.name).toMatch(/^cmath@\d+\.\d+\.\d+$/);
    expect(target!.settings).toEqual({ protocol: 'stdio', command: `/usr/bin/python3 ${CMATH_SCRIPT}` });
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj z) = conj csqrt z, so sqrt(−4 − 0i) = 0 − 2i; Python's cmath follows it.
    expect(await sqrtMinusFour(target!.open())).toEqual({ value: [0, -2] });
    const spec = target!.worker as { module: string; args: unknown[] };
    const reopened = (require(spec.module) as { openTarget(...a: unknown[]): Target }).openTarget(
      ...JSON.parse(JSON.stringify(spec.args)),
    );
    expect(reopened.name).toBe(target!.name);
    expect(await sqrtMinusFour(reopened)).toEqual({ value: [0, -2] });
    // The convention its describe states reaches the descriptor and the reopened target alike.
    expect([target!.convention, reopened.convention]).toEqual(['signed-zero', 'signed-zero']);
  });

  describe('in a worker thread', () => {
    const cache = seededReferenceCache();
    it('runs a configured local target with --workers as in process, with the same counts', async () => {
      const [local] = await resolveTargetSource(
        { kind: 'local', path: COMPLEX_JS_2_3_0, name: 'complex.js-worker-copy' },
        { baseDir: ROOT, cacheDir: fresh('cache') },
      );
      const suites = [loadDemoSuite('sqrt-principal-sz')];
      const inProcess = await runPlan(buildPlan(suites, [{ ...local!, worker: undefined }]), { cache });
      const inWorker = await runPlan(buildPlan(suites, [local!]), { cacheDir: cache.dir, workers: 1 });
      expect(inWorker.results.map((r) => [r.target.name, r.status, r.counts])).toEqual(
        inProcess.results.map((r) => [r.target.name, r.status, r.counts]),
      );
      // complex.js 2.3.0 fails points of the signed-zero sqrt suite (the −0 imaginary parts above).
      expect(inWorker.results[0]!.counts.fail).toBeGreaterThan(0);
      expect(inWorker.results[0]!.errors).toEqual([]);
    }, 60_000);
  });
});
