import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { PACKAGE_ROOT } from '../package-root';
import { cComplexTarget } from './c-complex-target';
import { CMATH_ENTRIES } from './cmath-entries';
import { compareVersions } from './compare-versions';
import { complexJsTarget } from './complex-js-target';
import { installedVersion } from './installed-version';
import { jsMathTarget } from './js-math-target';
import { mathjsTarget } from './mathjs-target';
import { NUMPY_ENTRIES } from './numpy-entries';
import { pythonVersions } from './python-versions';
import { targetIdentityOf } from '../../shared/target-identity-of';
import { stdioTarget } from './stdio-target';
import { systemLibcVersion } from './system-libc-version';
import type { TargetEntry } from '../../shared/target-entry';
import type { TargetDescriptor } from './target-descriptor';

/** Debian's interpreter (docs/conventions.md): the python3 first on PATH may be another one. */
const DEBIAN_PYTHON = '/usr/bin/python3';
/** Debian's gcc, which builds the C adapter on first use (harness/adapters/c-adapter-binary.ts). */
const DEBIAN_GCC = '/usr/bin/gcc';

/**
 * The targets installed in the project, without loading any library: complex.js and
 * mathjs under their own name and every npm alias of them in package.json's
 * dependencies (versions read from each installed package.json), mathjs four ways
 * (complex and number entry points, predictable off and on), JavaScript's Math, and
 * through the stdio protocol: Python's cmath when /usr/bin/python3 runs, NumPy when that Python
 * has it, and the system C library's <complex.h> when gcc is there (listed without compiling:
 * opening it compiles the adapter if the cache has none). Sorted by library, then version
 * (numerically), then name.
 */
export function discoverTargets(
  root: string = PACKAGE_ROOT,
  python: string = DEBIAN_PYTHON,
  compiler: string = DEBIAN_GCC,
): TargetDescriptor[] {
  const manifest = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8')) as {
    dependencies?: Record<string, string>;
  };
  const targets: TargetDescriptor[] = [];
  for (const alias of Object.keys(manifest.dependencies ?? {})) {
    const installed = installedVersion(root, alias);
    if (!installed) continue;
    const { name, version } = installed;
    if (name === 'complex.js') {
      targets.push({
        ...targetIdentityOf(complexJsTarget(alias, version)),
        open: () => complexJsTarget(alias, version),
      });
    } else if (name === 'mathjs') {
      // mathjs brings its own complex.js; which one it resolves to is part of the target.
      // Node looks in the package's own node_modules first, then the project's.
      const own = installedVersion(path.join(root, 'node_modules', alias), 'complex.js');
      const complexJs = (own ?? installedVersion(root, 'complex.js'))?.version ?? 'unknown';
      for (const entry of ['complex', 'number'] as const) {
        for (const predictable of [false, true]) {
          const open = () => mathjsTarget(alias, version, entry, predictable, complexJs);
          targets.push({ ...targetIdentityOf(open()), open });
        }
      }
    }
  }
  targets.push({ ...targetIdentityOf(jsMathTarget()), open: jsMathTarget });
  const versions = existsSync(python) ? pythonVersions(python) : null;
  // Python's own cmath, then NumPy when that Python has it: one adapter script each.
  const adapters: [string, string | null | undefined, string, readonly TargetEntry[]][] = [
    ['cmath', versions?.python, 'cmath_adapter.py', CMATH_ENTRIES],
    ['numpy', versions?.numpy, 'numpy_adapter.py', NUMPY_ENTRIES],
  ];
  for (const [library, version, file, entries] of adapters) {
    if (!version) continue;
    const script = path.join(PACKAGE_ROOT, 'harness', 'adapters', 'python', file);
    const open = () =>
      stdioTarget({
        name: `${library}@${version}`,
        library,
        version,
        settings: { protocol: 'stdio', command: `${python} ${path.relative(PACKAGE_ROOT, script)}` },
        entries: [...entries],
        // Python documents that the sign of a zero picks the side of each cmath cut (the cmath
        // module's documentation, from memory); NumPy's complex functions are the C library's
        // (docs/c-and-numpy-adapters.md, bit for bit over 5,000 seeded calls each).
        convention: 'signed-zero',
        command: python,
        args: [script],
      });
    targets.push({ ...targetIdentityOf(open()), open });
  }
  if (existsSync(compiler)) {
    const libc = systemLibcVersion();
    const open = () => cComplexTarget({ ...libc, compiler });
    targets.push({ ...targetIdentityOf(open()), open });
  }
  return targets.sort(
    (a, b) =>
      a.library.localeCompare(b.library) || compareVersions(a.version, b.version) || a.name.localeCompare(b.name),
  );
}
