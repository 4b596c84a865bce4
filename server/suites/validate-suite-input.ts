import { checkSuite } from '../../harness';
import type { Suite } from '../../shared/schemas/suite-schema';
import { InputError } from '../http/input-error';

/**
 * A suite from a form or an upload, through the same full check the suite form runs (shared
 * schema, subject whitelist, cut layout). Any problem becomes a 400 naming `<where>.<field>`.
 */
export function validateSuiteInput(data: unknown, where: string, fallbackName: string): Suite {
  const checked = checkSuite(data, fallbackName);
  if (!checked.ok) throw new InputError(checked.issues.map((i) => ({ field: `${where}.${i.field}`, rule: i.rule })));
  return checked.suite;
}
