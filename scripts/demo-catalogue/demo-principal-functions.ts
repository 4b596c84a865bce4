import { CATALOGUE_ENTRIES, type DemoPrincipalFunction } from '../../harness';

/**
 * The cuts and branch points of every catalogue function's principal branch, from the DLMF
 * definitions (§4.2 log and powers, §4.23 inverse trigonometric, §4.37 inverse hyperbolic);
 * the reciprocal functions follow from f(1/z). The stories are the demo team's. Computed from
 * each catalogue entry's `demo` suites (harness/catalogue/entries), in the catalogue's order.
 */
export const DEMO_PRINCIPAL_FUNCTIONS: readonly DemoPrincipalFunction[] = CATALOGUE_ENTRIES.flatMap(
  (entry) => entry.demo,
);
