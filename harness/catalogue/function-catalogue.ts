import type { FunctionName } from '../../shared/function-arity';
import { sqrtEntry } from './entries/sqrt-entry';
import { logEntry } from './entries/log-entry';
import { cbrtEntry } from './entries/cbrt-entry';
import { nthrootEntry } from './entries/nthroot-entry';
import { powEntry } from './entries/pow-entry';
import { expEntry } from './entries/exp-entry';
import { asinEntry } from './entries/asin-entry';
import { acosEntry } from './entries/acos-entry';
import { atanEntry } from './entries/atan-entry';
import { asinhEntry } from './entries/asinh-entry';
import { acoshEntry } from './entries/acosh-entry';
import { atanhEntry } from './entries/atanh-entry';
import { acotEntry } from './entries/acot-entry';
import { asecEntry } from './entries/asec-entry';
import { acscEntry } from './entries/acsc-entry';
import { acothEntry } from './entries/acoth-entry';
import { asechEntry } from './entries/asech-entry';
import { acschEntry } from './entries/acsch-entry';
import type { FunctionEntry } from './function-entry';

/**
 * The function catalogue: one entry per maths function a subject may call, keyed by the names
 * of shared/function-arity.ts (the type makes the two sets equal; that light table also holds
 * each function's arity, for the adapters and the subject parser). Every other table keyed by
 * function name is computed from it: the reference engine's dispatch (harness/reference/catalogue.ts)
 * and cuts (harness/cuts/catalogue-cuts.ts), the rules of findings (harness/checks/function-rules.ts),
 * principal ranges (harness/properties/principal-range.ts), sheet families
 * (harness/runner/subject-sheet-family.ts), the fingerprint's functions
 * (harness/fingerprint/fingerprint-functions.ts) and the demo catalogue's principal suites
 * (scripts/demo-catalogue/demo-principal-functions.ts). The order here is the order of the
 * fingerprint's rows.
 */
export const FUNCTION_CATALOGUE: Readonly<Record<FunctionName, FunctionEntry>> = {
  sqrt: sqrtEntry,
  log: logEntry,
  cbrt: cbrtEntry,
  nthroot: nthrootEntry,
  pow: powEntry,
  exp: expEntry,
  asin: asinEntry,
  acos: acosEntry,
  atan: atanEntry,
  asinh: asinhEntry,
  acosh: acoshEntry,
  atanh: atanhEntry,
  acot: acotEntry,
  asec: asecEntry,
  acsc: acscEntry,
  acoth: acothEntry,
  asech: asechEntry,
  acsch: acschEntry,
};
