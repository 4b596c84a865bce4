import { CATALOGUE_ENTRIES } from '../catalogue/catalogue-entries';
import type { ReferenceEvaluation } from '../catalogue/reference-evaluation';

/**
 * How the reference engine evaluates every function of the catalogue, by name: computed from
 * the function catalogue (harness/catalogue/function-catalogue.ts). Powers and roots (pow, cbrt,
 * nthroot) take an exponent and are listed as `power`.
 */
export const catalogue: Readonly<Record<string, ReferenceEvaluation>> = Object.fromEntries(
  CATALOGUE_ENTRIES.map((entry) => [entry.name, entry.reference]),
);
