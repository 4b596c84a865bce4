import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Suite } from '../../../../shared/schemas/suite-schema';
import { validateSuite } from '../../../../shared/validate-suite';

/** A suite of the demo catalogue (suites/demo), validated. */
export function loadDemoSuite(id: string): Suite {
  const file = path.join(__dirname, '..', '..', '..', '..', 'suites', 'demo', `${id}.json`);
  const checked = validateSuite(JSON.parse(readFileSync(file, 'utf8')), id);
  if (!checked.ok) throw new Error(`${id} is invalid`);
  return checked.suite;
}
