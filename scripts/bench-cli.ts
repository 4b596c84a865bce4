/**
 * `npm run bench:cli` — the whole-process time of the compiled CLI for one demo suite (issue
 * item 4: ≤ 0.6 s wall on a quiet machine). Runs packages/cli's `sheetkeeper run` (built by
 * `npm run build:cli`; BENCH_CLI_BIN names another, e.g. an install's
 * node_modules/.bin/sheetkeeper) ROUNDS times, each paired with `node -e 0` just before it, and
 * prints the median wall time of each, their ratio and the load average. The reference cache is a
 * fresh temporary folder: the first run computes the suite's reference values and is reported on
 * its own; the medians are over the runs after it. The target is a complex.js release given by
 * path (`--local`, the root's node_modules/complex.js), as a maintainer names a working copy;
 * BENCH_CLI_TARGET names an installed target instead (cmath@3.11.2: a Python process, and target
 * discovery starts Python too). BENCH_CLI_SUITE (sqrt-principal-sz) and BENCH_CLI_ROUNDS (9)
 * change the rest. Nothing is written outside the temporary folder.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { CLI_PACKAGE_DIR } from './cli-package/build-cli-package';

const bin = process.env.BENCH_CLI_BIN ?? path.join(CLI_PACKAGE_DIR, 'bin', 'sheetkeeper.js');
if (!existsSync(path.join(CLI_PACKAGE_DIR, 'dist')) && !process.env.BENCH_CLI_BIN) {
  console.error('bench:cli: packages/cli has no dist/; run `npm run build:cli` first');
  process.exit(2);
}
const suite = process.env.BENCH_CLI_SUITE ?? 'sqrt-principal-sz';
const rounds = Number(process.env.BENCH_CLI_ROUNDS ?? 9);
const cacheDir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-bench-cli-'));

/** Wall milliseconds of one process, which must exit with one of `codes`. */
function wall(command: string, args: string[], codes: number[]): number {
  const start = process.hrtime.bigint();
  const r = spawnSync(command, args, { encoding: 'utf8' });
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  if (r.status === null || !codes.includes(r.status))
    throw new Error(`${command} ${args.join(' ')} exited ${r.status}: ${r.stderr}`);
  return ms;
}

/** The flags that name the target. */
const targetFlags = process.env.BENCH_CLI_TARGET
  ? ['--target', process.env.BENCH_CLI_TARGET]
  : ['--local', path.join(CLI_PACKAGE_DIR, '..', '..', 'node_modules', 'complex.js')];

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
try {
  // Exit 1 and 3 are findings of the library, not failures of the run.
  const run = () =>
    wall(
      process.execPath,
      [
        bin,
        'run',
        '--suite',
        suite,
        ...targetFlags,
        '--format',
        'json',
        '--out',
        path.join(cacheDir, 'r.json'),
        '--cache',
        cacheDir,
      ],
      [0, 1, 3],
    );
  const cold = run();
  const cli: number[] = [];
  const bare: number[] = [];
  for (let i = 0; i < rounds; i++) {
    bare.push(wall(process.execPath, ['-e', '0'], [0]));
    cli.push(run());
  }
  const [m, b] = [median(cli), median(bare)];
  console.log(`sheetkeeper run --suite ${suite} ${targetFlags.join(' ')} (${bin})`);
  console.log(`  first run (reference values computed): ${cold.toFixed(0)} ms`);
  console.log(`  median of ${rounds}: ${m.toFixed(0)} ms; node -e 0: ${b.toFixed(0)} ms; ratio ${(m / b).toFixed(2)}`);
  console.log(
    `  load average: ${os
      .loadavg()
      .map((x) => x.toFixed(2))
      .join(' ')}`,
  );
} finally {
  rmSync(cacheDir, { recursive: true, force: true });
}
