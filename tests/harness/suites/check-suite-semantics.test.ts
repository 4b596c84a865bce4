import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { checkSuiteSemantics } from '../../../harness/suites/check-suite-semantics';
import type { Suite } from '../../../shared/schemas/suite-schema';
import { validateSuite } from '../../../shared/validate-suite';

const DIR = path.join(__dirname, '..', '..', '..', 'suites', 'demo');
const load = (id: string): Suite => {
  const checked = validateSuite(JSON.parse(readFileSync(path.join(DIR, `${id}.json`), 'utf8')), id);
  if (!checked.ok) throw new Error(`${id} is invalid`);
  return checked.suite;
};

describe('checkSuiteSemantics', () => {
  it('finds nothing wrong in any demo suite', () => {
    for (const file of readdirSync(DIR).filter((f) => f.endsWith('.json'))) {
      const id = file.replace(/\.json$/, '');
      expect({ id, issues: checkSuiteSemantics(load(id)) }).toEqual({ id, issues: [] });
    }
  });

  it('names a subject outside the whitelist', () => {
    const suite = { ...load('sqrt-principal-sz'), subject: 'sqrt(z) + gamma(z)' };
    const [issue] = checkSuiteSemantics(suite);
    expect(issue).toMatchObject({ suite: 'sqrt-principal-sz', field: 'subject' });
    expect(issue!.rule).toMatch(/gamma/);
  });

  it("names a counterpart's subject outside the whitelist under its own field", () => {
    const suite = { ...load('sqrt-principal-sz'), counterparts: [{ subject: 'z^(1/2)' }, { subject: 'zeta(z)' }] };
    const issues = checkSuiteSemantics(suite);
    expect(issues.map((i) => i.field)).toEqual(['counterparts.1.subject']);
    expect(issues[0]!.rule).toMatch(/zeta/);
  });

  it('refuses a layout that leaves a branch point of √(z²−1) without a cut', () => {
    // √(z²−1) has branch points ±1 (ν·m = ½ ∉ ℤ): a single ray from +1 leaves −1 uncut.
    const base = load('sqrt-z2-minus-1-finite-cut');
    if (base.branch.kind !== 'regular') throw new Error('expected a regular suite');
    const suite: Suite = {
      ...base,
      branch: {
        ...base.branch,
        cuts: [
          {
            points: [
              { re: '1', im: '0' },
              { re: '2', im: '0' },
            ],
            to_infinity: true,
          },
        ],
      },
    };
    const [issue] = checkSuiteSemantics(suite);
    expect(issue).toMatchObject({ suite: base.id, field: 'branch.cuts' });
    expect(issue!.rule).toMatch(/-1|−1/);
  });

  it('refuses a finite cut around which the monodromy is not 1', () => {
    // Argument principle: a loop around the cut [0, 1] of √(z(z−1)(z+1)) encloses two zeros,
    // e^{2πi·½·2} = 1, but with ∛ it is e^{2πi·⅓·2} ≠ 1, so [0, 1] alone is not enough.
    const base = load('sqrt-z2-minus-1-finite-cut');
    if (base.branch.kind !== 'regular') throw new Error('expected a regular suite');
    const suite: Suite = {
      ...base,
      branch: {
        ...base.branch,
        g: 'z^3 - z',
        nu: '1/3',
        cuts: [
          {
            points: [
              { re: '0', im: '0' },
              { re: '1', im: '0' },
            ],
            to_infinity: false,
          },
          {
            points: [
              { re: '-1', im: '0' },
              { re: '-2', im: '0' },
            ],
            to_infinity: true,
          },
        ],
      },
    };
    const issues = checkSuiteSemantics(suite);
    expect(issues).toHaveLength(1);
    expect(issues[0]!.field).toBe('branch.cuts');
  });
});
