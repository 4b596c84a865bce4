import { checkSuiteSemantics } from '../../harness/suites/check-suite-semantics';
import type { Suite } from '../../shared/schemas/suite-schema';
import { validateSuite } from '../../shared/validate-suite';
import { InputError } from './input-error';

/**
 * A suite from a form or an upload: the shared schema first, then what only the harness can
 * check (subject whitelist, cut layout). Any problem becomes a 400 naming `<where>.<field>`.
 */
export function validateSuiteInput(data: unknown, where: string, fallbackName: string): Suite {
  const checked = validateSuite(data, fallbackName);
  if (!checked.ok) throw new InputError(checked.issues.map((i) => ({ field: `${where}.${i.field}`, rule: i.rule })));
  const deeper = checkSuiteSemantics(checked.suite);
  if (deeper.length > 0) throw new InputError(deeper.map((i) => ({ field: `${where}.${i.field}`, rule: i.rule })));
  return checked.suite;
}
