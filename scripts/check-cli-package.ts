/**
 * The packed CLI from an empty folder, as a maintainer gets it (docs/cli-package.md), run by
 * `npm test` as a step of its own beside the static checks (13 s wall on the quiet 2-core
 * machine, most of it npm writing ~2,000 files; too long for a jest file). Builds the package into
 * a temporary folder outside the repository and packs it; runs the shell recipe of
 * docs/ci-recipes.md (docs/ci/sheetkeeper-check.sh) with it, which installs the tarball with
 * `npm install --offline` (the dependencies are bundled) into an empty folder, runs a principal and
 * a composed demo suite against a copy of the root's complex.js release as the working copy
 * (`--local .`), writes JUnit and prints the summary; then runs `npx sheetkeeper run --local PATH
 * --format junit` in that install. Nothing in the repository is within reach: Node resolves modules
 * from the install's own node_modules and the harness finds its files from its own package root.
 * Exits 1 naming what failed; prints each step's time, the tarball and the install sizes.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildCliPackage } from './cli-package/build-cli-package';

const STEP_MS = 180_000;
const work = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-cli-package-'));
const pkg = path.join(work, 'package');
const install = path.join(work, 'install');
// The installed CLI keeps its reference cache in the user's cache folder: here, inside the temporary folder.
const env = { ...process.env, SHEETKEEPER_CACHE_DIR: path.join(work, 'cache') };

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
    env,
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
  // A complex.js release given by path, as a maintainer's working copy: 2.4.3 loses the −0 of
  // sqrt's input on the cut (branch findings, exit 1).
  const library = path.join(work, 'complex.js');
  cpSync(path.join(__dirname, '..', 'node_modules', 'complex.js'), library, { recursive: true });
  const version = (JSON.parse(readFileSync(path.join(library, 'package.json'), 'utf8')) as { version: string }).version;
  const recipe = timed('docs/ci/sheetkeeper-check.sh --local . (npm install --offline, run, summary)', () =>
    spawnSync('bash', [path.join(__dirname, '..', 'docs', 'ci', 'sheetkeeper-check.sh')], {
      cwd: library,
      encoding: 'utf8',
      timeout: STEP_MS,
      env: {
        ...env,
        SHEETKEEPER_TARBALL: path.join(work, tarball),
        SHEETKEEPER_TOOLS: install,
        SHEETKEEPER_OUT: path.join(work, 'results'),
        SHEETKEEPER_SUITES: 'sqrt-principal-sz,sqrt-z2-minus-1-finite-cut',
        SHEETKEEPER_NPM_FLAGS: '--offline',
      },
    }),
  );
  console.log(recipe.stdout.trimEnd());
  if (recipe.status !== 1)
    throw new Error(`the recipe exited ${recipe.status}, not 1 (branch findings): ${recipe.stderr}`);
  if (
    !/^first branch findings:$/m.test(recipe.stdout) ||
    !recipe.stdout.includes(`× complex.js@${version}, "straddle cut 1"`)
  )
    throw new Error(`the recipe printed no branch findings of complex.js ${version}: ${recipe.stdout}`);
  const recipeJunit = readFileSync(path.join(work, 'results', 'sheetkeeper.xml'), 'utf8');
  if (!recipeJunit.includes('sqrt-z2-minus-1-finite-cut')) throw new Error('the recipe wrote no JUnit of both suites');
  const run = timed('npx sheetkeeper run --local <complex.js copy> --format junit', () =>
    npx(['run', '--suite', 'sqrt-principal-sz', '--local', library, '--format', 'junit', '--out', 'sheetkeeper.xml']),
  );
  if (run.status !== 1) throw new Error(`sheetkeeper run exited ${run.status}, not 1: ${run.stderr}`);
  const junit = readFileSync(path.join(install, 'sheetkeeper.xml'), 'utf8');
  if (!junit.startsWith('<?xml') || !/<testsuites[\s>]/.test(junit) || !junit.includes(`complex.js@${version}`))
    throw new Error(`sheetkeeper.xml is not the JUnit of complex.js ${version}: ${junit.slice(0, 300)}`);
  console.log(`[cli-package] ${run.stderr.trim()}`);
  console.log(
    `[cli-package] tarball ${(statSync(path.join(work, tarball)).size / 1e6).toFixed(1)} MB; ` +
      `installed node_modules ${(sizeKb(path.join(install, 'node_modules')) / 1024).toFixed(1)} MiB of file contents`,
  );
} catch (e) {
  console.error(`[cli-package] ${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
} finally {
  rmSync(work, { recursive: true, force: true });
}
