import { validateSuite } from '../../../shared/validate-suite';

const suite = (counterparts: unknown) => ({
  id: 'agree',
  version: 1,
  title: 'Two ways agree',
  subject: 'sqrt(z)',
  branch: { kind: 'principal' },
  convention: 'signed-zero',
  paths: [{ kind: 'points', name: 'p', points: [{ re: '-4', im: '-0' }] }],
  tolerances: { values: { ulps: 4 } },
  counterparts,
});
const rules = (counterparts: unknown) => {
  const v = validateSuite(suite(counterparts), 'agree.json');
  return v.ok ? [] : v.issues.map((i) => `${i.field} ${i.rule}`);
};

describe('counterpartSchema', () => {
  it('takes another subject, another entry, or both, and defaults to none', () => {
    expect(
      rules([{ subject: 'z^(1/2)' }, { entry: 'parser' }, { subject: 'pow(z, 1/2)', entry: 'object-form' }]),
    ).toEqual([]);
    const v = validateSuite({ ...suite(undefined), counterparts: undefined }, 'agree.json');
    expect(v.ok && v.suite.counterparts).toEqual([]);
  });

  it('names the field and the rule for an empty counterpart, an unknown field, a bad entry name and too many', () => {
    expect(rules([{}])).toEqual(['counterparts.0.subject give a subject, an entry or both']);
    expect(rules([{ subject: 'z^(1/2)', name: 'x' }])[0]).toMatch(/^counterparts\.0/);
    expect(rules([{ entry: 'Bad Entry' }])).toEqual([
      'counterparts.0.entry must be a lower-case word such as "complex" or "string"',
    ]);
    expect(rules([{ subject: 'sqrt(z\u0000)' }])[0]).toMatch(/^counterparts\.0\.subject must not contain the NUL/);
    expect(rules(Array.from({ length: 5 }, () => ({ subject: 'z^(1/2)' })))).toEqual([
      'counterparts must have at most 4 counterparts',
    ]);
  });
});
