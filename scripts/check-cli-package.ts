/**
 * The packed CLI from an empty folder, as a maintainer gets it (docs/cli-package.md), run by
 * `npm test` as a step of its own beside the static checks (packing and installing took 25–30 s
 * on the shared 2-core machine, too long for a jest file). Builds the package into a temporary
 * folder outside the repository, packs it, installs the tarball into an empty folder with
 * `npm install --offline` (no registry: the dependencies are bundled), and there runs
 * `npx sheetkeeper run` on a principal and a composed demo suite with `--format junit`. Nothing
 * in the repository is within reach of the install: Node resolves modules from the install's own
 * node_modules and the harness finds its files from its own package root. Exits 1 naming the
 * step that failed; prints the tarball and install sizes and each step's time.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildCliPackage } from './cli-package/build-cli-package';

const STEP_MS = 180_000;
const work = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-cli-package-'));
const pkg = path.join(work, 'package');
const install = path.join(work, 'install');

function timed<T>(label: string, step: () => T): T {
  const start = Date.now();
  const value = step();
  console.log(`[cli-package] ${label}: ${((Date.now() - start) / 1000).toFixed(1)} s`);
  return value;
}

function sizeKb(dir: string): number {
  return readdirSync(dir, { withFileTypes: true }).reduce(
    (sum, e) => sum + (e.isDirectory() ? sizeKb(path.join(dir, e.name)) : statSync(path.join(dir, e.name)).size / 1024),
    0,
  );
}

function npx(args: string[]): { status: number | null; stdout: string; stderr: string } {
  return spawnSync('npx', ['--offline', '--no-install', 'sheetkeeper', ...args], {
    cwd: install,
    encoding: 'utf8',
    timeout: STEP_MS,
  });
}

try {
  timed('build', () => buildCliPackage(pkg, { bundle: true }));
  const tarball = timed(
    'npm pack',
    () =>
      execFileSync('npm', ['pack', '--silent', '--pack-destination', work], {
        cwd: pkg,
        encoding: 'utf8',
        timeout: STEP_MS,
      })
        .trim()
        .split('\n')
        .pop() as string,
  );
  mkdirSync(install);
  timed('npm install --offline', () =>
    execFileSync('npm', ['install', '--offline', '--no-audit', '--no-fund', path.join(work, tarball)], {
      cwd: install,
      stdio: 'inherit',
      timeout: STEP_MS,
    }),
  );
  const listed = npx(['targets', '--format', 'json']);
  if (listed.status !== 0) throw new Error(`sheetkeeper targets exited ${listed.status}: ${listed.stderr}`);
  const jsMath = (JSON.parse(listed.stdout) as { name: string }[]).find((t) => t.name.startsWith('js-math@'));
  if (!jsMath) throw new Error(`sheetkeeper targets lists no js-math target: ${listed.stdout}`);
  const run = timed('sheetkeeper run', () =>
    npx([
      'run',
      '--suite',
      'sqrt-principal-sz,sqrt-z2-minus-1-finite-cut',
      '--target',
      jsMath.name,
      '--format',
      'junit',
      '--out',
      'sheetkeeper.xml',
    ]),
  );
  // JavaScript's Math loses sqrt's zero signs: branch findings, exit 1.
  if (run.status !== 1) throw new Error(`sheetkeeper run exited ${run.status}, not 1: ${run.stderr}`);
  const junit = readFileSync(path.join(install, 'sheetkeeper.xml'), 'utf8');
  if (!junit.startsWith('<?xml') || !/<testsuites[\s>]/.test(junit) || !junit.includes('sqrt-z2-minus-1-finite-cut'))
    throw new Error(`sheetkeeper.xml is not the JUnit of both suites: ${junit.slice(0, 300)}`);
  console.log(`[cli-package] ${run.stderr.trim()}`);
  console.log(
    `[cli-package] tarball ${(statSync(path.join(work, tarball)).size / 1024 / 1024).toFixed(1)} MB; ` +
      `installed node_modules ${(sizeKb(path.join(install, 'node_modules')) / 1024).toFixed(1)} MB`,
  );
} catch (e) {
  console.error(`[cli-package] ${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
} finally {
  rmSync(work, { recursive: true, force: true });
}
