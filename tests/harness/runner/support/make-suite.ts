import type { Suite, SuiteInput } from '../../../../shared/schemas/suite-schema';
import { validateSuite } from '../../../../shared/validate-suite';

/** A validated suite from a partial description, with small defaults for tests. */
export function makeSuite(input: Partial<SuiteInput> & Pick<SuiteInput, 'subject' | 'paths'>): Suite {
  const checked = validateSuite(
    {
      id: 'test-suite',
      version: 1,
      title: 'A test suite',
      branch: { kind: 'principal' },
      convention: 'signed-zero',
      tolerances: { values: { ulps: 4 } },
      ...input,
    },
    'test-suite',
  );
  if (!checked.ok) throw new Error(checked.issues.map((i) => `${i.field} ${i.rule}`).join('; '));
  return checked.suite;
}
