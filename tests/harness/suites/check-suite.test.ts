import { checkSuite } from '../../../harness/suites/check-suite';
import { demoCatalogue } from '../../../scripts/demo-catalogue/demo-catalogue';

const regular = () => JSON.parse(JSON.stringify(demoCatalogue().find((s) => s.id === 'sqrt-z2-minus-1-finite-cut')!));

describe('checkSuite', () => {
  it('accepts every demo suite', () => {
    for (const suite of demoCatalogue())
      expect({ id: suite.id, ok: checkSuite(suite, 'x.json').ok }).toEqual({ id: suite.id, ok: true });
  });

  it('names the branch point a layout leaves without a cut, under branch.cuts', () => {
    const suite = regular();
    suite.branch.cuts = [
      {
        points: [
          { re: '1', im: '0' },
          { re: '2', im: '0' },
        ],
        to_infinity: true,
      },
    ];
    const checked = checkSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.issues).toEqual([
      {
        suite: suite.id,
        field: 'branch.cuts',
        rule: expect.stringMatching(/branch point at \(-1, 0\).*lies on no cut/),
      },
    ]);
  });

  it('names the loop that crosses no cut but has monodromy other than 1', () => {
    // (z(z−1))^{1/3} with the single finite cut [0, 1]: a loop around it has monodromy e^{2πi·2/3}.
    const suite = regular();
    suite.branch = {
      kind: 'regular',
      g: 'z*(z - 1)',
      nu: '1/3',
      z0: { re: '2', im: '0' },
      k: 0,
      cuts: [
        {
          points: [
            { re: '0', im: '0' },
            { re: '1', im: '0' },
          ],
          to_infinity: false,
        },
      ],
    };
    const checked = checkSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok)
      expect(checked.issues[0]).toMatchObject({
        field: 'branch.cuts',
        rule: expect.stringMatching(
          /loop around the cut through \(0, 0\), \(1, 0\) crosses no cut, yet going once around it multiplies/,
        ),
      });
  });

  it('checks the cut layout even while other fields break the schema', () => {
    const suite = regular();
    suite.title = '';
    suite.branch.cuts = [];
    const checked = checkSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.issues.map((i) => i.field).sort()).toEqual(['branch.cuts', 'title']);
  });

  it('keeps one rule per broken subject: the schema rule, not a parser rule on top', () => {
    const suite = regular();
    suite.subject = '';
    const checked = checkSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.issues).toEqual([{ suite: suite.id, field: 'subject', rule: 'is required' }]);
  });

  it('names a subject outside the whitelist while the rest is unfinished', () => {
    const suite = regular();
    suite.paths = [];
    suite.subject = 'sqrt(z) + gamma(z)';
    const checked = checkSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.issues.map((i) => i.field)).toEqual(['paths', 'subject']);
  });

  it('skips the layout check when the branch spec itself is malformed', () => {
    const suite = regular();
    suite.branch.k = 'one';
    const checked = checkSuite(suite, 'x.json');
    expect(checked.ok).toBe(false);
    if (!checked.ok)
      expect(checked.issues.every((i) => i.field.startsWith('branch.') && i.field !== 'branch.cuts')).toBe(true);
  });
});
