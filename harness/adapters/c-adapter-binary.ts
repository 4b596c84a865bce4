import { execFile } from 'node:child_process';
import { createHash, randomBytes } from 'node:crypto';
import { accessSync, constants, mkdirSync, readFileSync, renameSync, rmSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);

/**
 * The flags the C adapter is built with. -O2 -std=c11 and never -ffast-math: that lets GCC assume
 * no infinities, NaNs or signed zeros, multiply and divide complex numbers without the Annex G
 * special cases (-fcx-limited-range) and fold x·0 to 0, which would test GCC's shortcuts instead of
 * the library. They are part of the cache key.
 */
export const C_ADAPTER_FLAGS: readonly string[] = ['-O2', '-std=c11', '-Wall'];

export interface CAdapterBuild {
  /** The C source (harness/adapters/c/complex_adapter.c, or another for tests). */
  source: string;
  /** The compiler to run (Debian's /usr/bin/gcc). */
  compiler: string;
  /** The folder binaries are kept in, one per source and compiler version. */
  folder: string;
}

/** Measured: gcc 12 builds the adapter in ~0.4 s on an idle 2-core machine; a loaded one can take several times that. */
const COMPILE_LIMIT_MS = 60_000;

/**
 * The path of the compiled adapter, built now if the cache has none for this source and compiler.
 * The binary's name carries a hash of the source text, the compiler's `--version` and the flags, so
 * an edited source or another gcc gets its own binary and a stale one is never run. It is compiled to
 * a temporary name in the same folder and renamed into place, an atomic step: two processes
 * compiling at once each rename a complete binary, and the folder ends with one good file under the
 * final name. Rejects with the compiler's own message when the source does not compile.
 */
export async function cAdapterBinary(build: CAdapterBuild): Promise<string> {
  const text = readFileSync(build.source, 'utf8');
  let version: string;
  try {
    version = (await run(build.compiler, ['--version'], { timeout: 10_000 })).stdout;
  } catch (e) {
    throw new Error(`the C compiler ${build.compiler} does not run: ${e instanceof Error ? e.message : String(e)}`);
  }
  const key = createHash('sha256')
    .update(text)
    .update('\0')
    .update(version)
    .update('\0')
    .update(C_ADAPTER_FLAGS.join(' '))
    .digest('hex')
    .slice(0, 16);
  const binary = path.join(build.folder, `complex-adapter-${key}`);
  try {
    accessSync(binary, constants.X_OK);
    return binary;
  } catch {
    // Not built yet for this source and compiler.
  }
  mkdirSync(build.folder, { recursive: true });
  const temporary = `${binary}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`;
  try {
    // LC_ALL=C: the compiler's message in plain ASCII English, whatever the user's locale.
    await run(build.compiler, [...C_ADAPTER_FLAGS, '-o', temporary, build.source, '-lm'], {
      timeout: COMPILE_LIMIT_MS,
      env: { ...process.env, LC_ALL: 'C' },
    });
  } catch (e) {
    rmSync(temporary, { force: true });
    const stderr = (e as { stderr?: unknown }).stderr;
    const said = typeof stderr === 'string' && stderr.trim() ? stderr.trim().slice(-1500) : String(e);
    throw new Error(`the C adapter did not compile (${build.compiler} ${build.source}): ${said}`);
  }
  renameSync(temporary, binary);
  return binary;
}
