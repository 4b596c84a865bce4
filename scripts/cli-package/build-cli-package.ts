import { execFileSync } from 'node:child_process';
import { cpSync, mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { lockedClosure } from './locked-closure';

const ROOT = path.join(__dirname, '..', '..');
/** The package's own files (package.json, bin/, README.md, tsconfig.json), kept in git. */
export const CLI_PACKAGE_DIR = path.join(ROOT, 'packages', 'cli');
const TEMPLATE = ['package.json', 'bin', 'README.md'];
const CODE = /\.(c|m)?js$/;

/** Every file under a folder, as paths relative to it. */
function filesUnder(dir: string, rel = ''): string[] {
  return readdirSync(path.join(dir, rel), { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? filesUnder(dir, path.join(rel, e.name)) : [path.join(rel, e.name)],
  );
}

/**
 * Files of the bundled dependencies that the compiled CLI, which is CommonJS and loads them with
 * `require`, never reaches: type declarations, source maps, TypeScript sources (zod's src/) and
 * mathjs's ES-module and type trees (its `require` condition is lib/cjs). Leaving them out halves
 * the package (tarball 3.9 → 2.0 MB, installed 19.0 → 9.0 MiB), and the test step with it: 22 s →
 * 13 s wall and 24 → 15 s of CPU on a quiet machine (`node --import tsx scripts/check-cli-package.ts`),
 * and 78 s wall in a clean-clone `npm test` beside the static checks. scripts/check-cli-package.ts
 * runs the installed package, so a file left out that is needed fails there.
 */
const UNREACHED =
  /(\.d\.[cm]?ts|\.map)$|[\\/]node_modules[\\/](zod[\\/]src|mathjs[\\/]lib[\\/]esm|mathjs[\\/]types)([\\/]|$)/;

/**
 * Assembles the CLI package in `dest` (docs/cli-package.md): the CLI compiled to CommonJS under
 * dist/ (TypeScript 7's tsc, packages/cli/tsconfig.json), so nothing is transpiled at run time,
 * and what the harness reads at run time, copied by pattern, never by name: every file under
 * harness/ that is not TypeScript or a README, code (.cjs, .js, .mjs: the slice worker's entry)
 * beside the compiled modules under dist/harness/, anything else (adapter programs: Python, C
 * sources) under harness/, where PACKAGE_ROOT finds it as in the repository; suites/ whole (the
 * demo suites and suite.schema.json). With `bundle`, the dependencies' installed folders at the
 * root's locked versions go into node_modules/ (package.json says `bundleDependencies`), so the
 * packed tarball installs with no registry at all. Returns the number of harness files copied.
 */
export function buildCliPackage(dest: string, options: { bundle: boolean }): number {
  const own = path.resolve(dest) === CLI_PACKAGE_DIR;
  for (const dir of ['dist', 'harness', 'suites', 'node_modules', ...(own ? [] : TEMPLATE)])
    rmSync(path.join(dest, dir), { recursive: true, force: true });
  mkdirSync(dest, { recursive: true });
  if (!own)
    for (const file of TEMPLATE) cpSync(path.join(CLI_PACKAGE_DIR, file), path.join(dest, file), { recursive: true });
  const tsc = path.join(ROOT, 'node_modules', 'typescript-7', 'bin', 'tsc');
  execFileSync(process.execPath, [tsc, '-p', CLI_PACKAGE_DIR, '--outDir', path.join(dest, 'dist')], {
    stdio: 'inherit',
  });
  const harness = path.join(ROOT, 'harness');
  let copied = 0;
  for (const file of filesUnder(harness)) {
    if (file.endsWith('.ts') || path.basename(file) === 'README.md') continue;
    const to = CODE.test(file) ? path.join(dest, 'dist', 'harness', file) : path.join(dest, 'harness', file);
    mkdirSync(path.dirname(to), { recursive: true });
    cpSync(path.join(harness, file), to);
    copied++;
  }
  cpSync(path.join(ROOT, 'suites'), path.join(dest, 'suites'), { recursive: true });
  if (options.bundle) {
    const read = (file: string) => JSON.parse(readFileSync(file, 'utf8'));
    const manifest = read(path.join(CLI_PACKAGE_DIR, 'package.json')) as { dependencies: Record<string, string> };
    for (const at of lockedClosure(Object.keys(manifest.dependencies), read(path.join(ROOT, 'package-lock.json'))))
      cpSync(path.join(ROOT, at), path.join(dest, at), { recursive: true, filter: (from) => !UNREACHED.test(from) });
  }
  return copied;
}
