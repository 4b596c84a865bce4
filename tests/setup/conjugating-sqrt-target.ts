import { complexJsTarget } from '../../harness/adapters/complex-js-target';
import type { Target } from '../../harness/adapters/target';

/**
 * A library under test named `<library>@<version>`, built on complex.js 2.4.3: version 1 is
 * complex.js itself, version 2 returns the conjugate of √z in the upper half-plane, so a run of
 * the sqrt demo suite on version 2 has real branch findings (and regressions after version 1).
 */
export function conjugatingSqrtTarget(library: string, version: '1' | '2'): Target {
  const base = complexJsTarget('complex.js', '2.4.3');
  return {
    name: `${library}@${version}`,
    library,
    version,
    settings: {},
    supports: (op) => base.supports(op),
    close: () => base.close(),
    evaluate: async (op, calls) => {
      const results = await base.evaluate(op, calls);
      if (version === '1' || op !== 'sqrt') return results;
      return results.map((r, i) => ('value' in r && calls[i]![0]![1] > 0 ? { value: [r.value[0], -r.value[1]] } : r));
    },
  };
}
