import { spawnSync } from 'node:child_process';

/**
 * The system C library's name and version as `getconf GNU_LIBC_VERSION` reports them ("glibc",
 * "2.36"), without compiling anything; the C adapter's `describe` answers the same from
 * gnu_get_libc_version(). A C library that is not glibc has no such variable: "libc", "unknown",
 * as the adapter answers there. Takes ~2 ms.
 */
export function systemLibcVersion(): { library: string; version: string } {
  const run = spawnSync('getconf', ['GNU_LIBC_VERSION'], { encoding: 'utf8', timeout: 5000 });
  const match = run.status === 0 ? /^glibc (\S+)/.exec(run.stdout.trim()) : null;
  return match ? { library: 'glibc', version: match[1] as string } : { library: 'libc', version: 'unknown' };
}
