import { demoCatalogue } from '../../scripts/demo-catalogue/demo-catalogue';
import { validateSuite } from '../../shared/validate-suite';

const base = () => JSON.parse(JSON.stringify(demoCatalogue()[0]));

describe('validateSuite', () => {
  it('accepts a demo suite and fills in the default straddle offsets', () => {
    const checked = validateSuite(base(), 'x.json');
    expect(checked.ok).toBe(true);
  });

  it('names the suite, the field and the rule', () => {
    const suite = base();
    suite.paths[1].radius = 2;
    const checked = validateSuite(suite, 'x.json');
    expect(checked).toEqual({
      ok: false,
      issues: [{ suite: suite.id, field: 'paths.1.radius', rule: 'must be a number written as a string' }],
    });
  });

  it('takes an entry on the suite and on a path, and names the field of a malformed one', () => {
    const suite = base();
    suite.entry = 'string';
    suite.paths[0].entry = 'object';
    const ok = validateSuite(suite, 'x.json');
    expect(ok.ok && [ok.suite.entry, ok.suite.paths[0]?.entry]).toEqual(['string', 'object']);
    suite.entry = 'Parser!';
    suite.paths[0].entry = 'obj\u0000ect';
    const bad = validateSuite(suite, 'x.json');
    expect(bad.ok ? [] : bad.issues.map((i) => i.field)).toEqual(['entry', 'paths.0.entry']);
  });

  it('names the file when the id itself is unusable', () => {
    const suite = base();
    suite.id = 'Not An Id';
    const checked = validateSuite(suite, 'upload.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok)
      expect(checked.issues[0]).toEqual({
        suite: 'upload.json',
        field: 'id',
        rule: 'must be lower-case words joined by hyphens',
      });
  });

  it('refuses a regular branch with both f0 and k', () => {
    const suite = demoCatalogue().find((s) => s.branch.kind === 'regular')!;
    const broken = JSON.parse(JSON.stringify(suite));
    broken.branch.f0 = { re: '1', im: '0' };
    const checked = validateSuite(broken, 'x.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok)
      expect(checked.issues).toContainEqual({
        suite: suite.id,
        field: 'branch.f0',
        rule: 'give exactly one of f0 and k',
      });
  });

  it('refuses two paths with the same name', () => {
    const suite = base();
    suite.paths[1].name = suite.paths[0].name;
    const checked = validateSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.issues[0]?.field).toBe('paths.1.name');
  });

  it('refuses a sampled path with neither samples nor at', () => {
    const suite = base();
    delete suite.paths[1].samples;
    const checked = validateSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok)
      expect(checked.issues[0]).toMatchObject({ field: 'paths.1.samples', rule: 'give exactly one of samples and at' });
  });
});
