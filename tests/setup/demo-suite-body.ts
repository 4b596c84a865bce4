import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { SuiteInput } from '../../shared/schemas/suite-schema';

/** A demo suite file (suites/demo/<id>.json) under a new id, as a form or an upload would send it. */
export function demoSuiteBody(newId: string, demoId = 'sqrt-principal-sz'): SuiteInput {
  const body = JSON.parse(
    readFileSync(path.join(__dirname, '..', '..', 'suites', 'demo', `${demoId}.json`), 'utf8'),
  ) as SuiteInput;
  return { ...body, id: newId };
}
