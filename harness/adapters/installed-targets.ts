import { discoverTargets } from './discover-targets';
import type { TargetDescriptor } from './target-descriptor';

let memo: TargetDescriptor[] | null = null;

/**
 * The targets installed with Sheetkeeper (discoverTargets with its defaults), discovered once per
 * process or worker thread. Discovery starts Python (cmath's and NumPy's versions) and probes the C
 * library, 52–76 ms each time on the shared 2-core machine, and what it finds does not change while
 * the process runs; every caller that means "the installed targets" reads this one list, so a worker
 * announces exactly the targets it can open.
 */
export function installedTargets(): TargetDescriptor[] {
  return (memo ??= discoverTargets());
}
