import { spawnSync } from 'node:child_process';
import { builtinModules } from 'node:module';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { discoverTargets } from '../../../harness';
import { buildCliPackage } from '../../../scripts/cli-package/build-cli-package';

const ROOT = path.join(__dirname, '..', '..', '..');
// Inside the repository, so the unbundled build finds its dependencies in the root's node_modules.
mkdirSync(path.join(ROOT, '.data'), { recursive: true });
const dest = mkdtempSync(path.join(ROOT, '.data', 'cli-build-'));
afterAll(() => rmSync(dest, { recursive: true, force: true }));

const filesUnder = (dir: string): string[] =>
  readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? filesUnder(path.join(dir, e.name)) : [path.join(dir, e.name)],
  );

/** A run's JSON without what differs from one run to the next (start and end times, durations). */
function runJson(bin: string, args: string[]): unknown {
  const r = spawnSync(process.execPath, [bin, ...args, '--format', 'json', '--no-cache'], {
    encoding: 'utf8',
    timeout: 60_000,
  });
  expect({ status: r.status, stderr: r.stderr }).toEqual({ status: 1, stderr: expect.any(String) });
  return JSON.parse(r.stdout, (key, value: unknown) =>
    key === 'startedAt' || key === 'finishedAt' || key === 'durationMs' ? '(time)' : value,
  );
}

describe('buildCliPackage', () => {
  it('compiles the CLI to JavaScript with every shipped file beside it and no TypeScript left', () => {
    expect(buildCliPackage(dest, { bundle: false })).toBeGreaterThan(0);
    const files = filesUnder(dest).map((f) => path.relative(dest, f));
    expect(files.filter((f) => f.endsWith('.ts'))).toEqual([]);
    expect(files).toEqual(
      expect.arrayContaining([
        'package.json',
        path.join('bin', 'sheetkeeper.js'),
        path.join('dist', 'harness', 'cli.js'),
        path.join('dist', 'harness', 'runner', 'slice-worker', 'slice-worker.js'),
        path.join('dist', 'harness', 'runner', 'slice-worker', 'slice-worker-entry.cjs'),
        path.join('harness', 'adapters', 'python', 'cmath_adapter.py'),
        path.join('suites', 'suite.schema.json'),
        path.join('suites', 'demo', 'sqrt-principal-sz.json'),
      ]),
    );
  });

  it('depends on exactly the packages the compiled code requires, lazily loaded ones included', () => {
    const required = new Set<string>();
    for (const file of filesUnder(path.join(dest, 'dist')).filter((f) => /\.c?js$/.test(f))) {
      const code = readFileSync(file, 'utf8')
        .split('\n')
        .filter((line) => !/^\s*(\*|\/\/|\/\*)/.test(line))
        .join('\n');
      for (const m of code.matchAll(/require\((['"])([^'"$./][^'"]*)\1\)/g)) {
        const spec = m[2] as string;
        const name = spec.startsWith('@') ? spec.split('/').slice(0, 2).join('/') : (spec.split('/')[0] as string);
        if (!name.startsWith('node:') && !builtinModules.includes(name)) required.add(name);
      }
    }
    const manifest = JSON.parse(readFileSync(path.join(dest, 'package.json'), 'utf8')) as {
      dependencies: Record<string, string>;
    };
    // tsx only where the slice worker runs from source (slice-worker-entry.cjs).
    expect([...required].filter((n) => n !== 'tsx').sort()).toEqual(Object.keys(manifest.dependencies).sort());
  });

  it('gives the same JSON result as the source CLI for a principal and a composed demo suite, on slice workers too', () => {
    expect(existsSync(path.join(dest, 'dist', 'harness', 'cli.js'))).toBe(true);
    // JavaScript's Math fails sqrt's points with a zero part and cannot take the rest: findings of
    // both classes, not applicable points and steps, through the same code either way.
    const jsMath = discoverTargets().find((t) => t.library === 'JavaScript Math')?.name as string;
    const args = ['run', '--suite', 'sqrt-principal-sz,sqrt-z2-minus-1-finite-cut', '--target', jsMath];
    const source = runJson(path.join(ROOT, 'bin', 'sheetkeeper.mjs'), args);
    expect(runJson(path.join(dest, 'bin', 'sheetkeeper.js'), args)).toEqual(source);
    expect(runJson(path.join(dest, 'bin', 'sheetkeeper.js'), [...args, '--workers', '1'])).toEqual(source);
  });
});
