import type { SuiteInput } from '../../shared/schemas/suite-schema';
import { DEMO_AGREEMENT_SUITES } from './demo-agreement-suites';
import { DEMO_COMPOSED_SUITES } from './demo-composed-suites';
import { DEMO_ENTRY_SUITES } from './demo-entry-suites';
import { DEMO_PRINCIPAL_FUNCTIONS } from './demo-principal-functions';
import { DEMO_REGULAR_SUITES } from './demo-regular-suites';
import { principalSuite } from './principal-suite';

/** The whole demo catalogue: every catalogue function under both conventions, the composed principal subjects, the regular branches, the agreement checks, then the entry suites. */
export function demoCatalogue(): SuiteInput[] {
  return [
    ...DEMO_PRINCIPAL_FUNCTIONS.flatMap((fn) => [
      principalSuite(fn, 'signed-zero'),
      principalSuite(fn, 'counter-clockwise'),
    ]),
    ...DEMO_COMPOSED_SUITES,
    ...DEMO_REGULAR_SUITES,
    ...DEMO_AGREEMENT_SUITES,
    ...DEMO_ENTRY_SUITES,
  ];
}
