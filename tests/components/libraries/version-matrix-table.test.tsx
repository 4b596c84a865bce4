import { fireEvent, render, screen } from '@testing-library/react';
import { VersionMatrixTable } from '../../../components/libraries/version-matrix-table';
import type { VersionMatrix } from '../../../shared/version-matrix';

const VERSIONS = ['2.3.0', '2.4.1', '2.4.3'];

/** One suite whose √ at −4 − 0i moved to the other side of the cut in 2.4.1, one that never changed. */
const SUITES: VersionMatrix['suites'] = [
  {
    id: 'sqrt-principal-sz',
    version: 1,
    subject: 'sqrt(z)',
    statusByVersion: [
      { version: '2.3.0', status: 'fail', fail: 3, pass: 41 },
      { version: '2.4.1', status: 'fail', fail: 1, pass: 43 },
      { version: '2.4.3', status: 'fail', fail: 1, pass: 43 },
    ],
    changes: [
      {
        path: 'straddle (-inf, 0]',
        index: 5,
        label: 'on -0',
        z: { re: '-4', im: '-0' },
        firstChangedIn: '2.4.1',
        steps: [
          {
            before: {
              version: '2.3.0',
              value: { re: '0', im: '2' },
              outcome: { kind: 'fail', diagnosis: { kind: 'zero-sign', part: 'im', of: 'input' } },
            },
            after: { version: '2.4.1', value: { re: '0', im: '-2' }, outcome: { kind: 'pass' } },
          },
        ],
      },
    ],
  },
  {
    id: 'exp-principal-sz',
    version: 2,
    subject: 'exp(z)',
    statusByVersion: VERSIONS.map((version) => ({ version, status: 'pass', fail: 0, pass: 30 })),
    changes: [],
  },
];

describe('VersionMatrixTable', () => {
  it("gives each suite's status at each version in words, and where its values changed", () => {
    render(<VersionMatrixTable library="complex.js" versions={VERSIONS} suites={SUITES} />);
    expect(screen.getByLabelText('sqrt-principal-sz at 2.3.0: 3 failed')).toBeTruthy();
    expect(screen.getByLabelText('sqrt-principal-sz at 2.4.1: 1 failed, 1 changed')).toBeTruthy();
    expect(screen.getByLabelText('sqrt-principal-sz at 2.4.3: 1 failed')).toBeTruthy();
    expect(screen.getByLabelText('exp-principal-sz at 2.4.3: pass (30)').textContent).toBe('2.4.3✓ pass (30)');
    expect(screen.getByTestId('matrix-sqrt-principal-sz').textContent).toContain('∆ 1 changed');
    expect(screen.getByTestId('matrix-summary').textContent).toBe(
      '2 suites over 3 versions of complex.js: 1 point in 1 suite changed value somewhere.',
    );
  });

  it('lists a changed point with its value and outcome on both sides, zero signs kept', () => {
    render(<VersionMatrixTable library="complex.js" versions={VERSIONS} suites={SUITES} />);
    const toggle = screen.getByRole('button', { name: 'Show 1 changed point of sqrt-principal-sz' });
    expect(toggle.getAttribute('aria-expanded')).toBe('false');
    fireEvent.click(toggle);
    const row = screen.getByTestId('matrix-sqrt-principal-sz').textContent!;
    expect(row).toContain('straddle (-inf, 0] · point 5 (on -0) · z = −4 − 0i');
    expect(row).toContain('first changed in 2.4.1');
    expect(row).toContain('2.3.0: 0 + 2i (× ignored zero sign)→ 2.4.1: 0 − 2i (✓ pass)');
    expect(screen.getByTestId('matrix-exp-principal-sz').textContent).toContain('No point of this suite changed value');
  });

  it('says which entry the values were built through when the matrix names one', () => {
    const atEntry = [{ ...SUITES[0]!, entry: 'complex' }];
    render(<VersionMatrixTable library="complex.js" versions={VERSIONS} suites={atEntry} />);
    expect(screen.getByTestId('matrix-sqrt-principal-sz').textContent).toContain(
      'values built through the complex entry',
    );
  });

  it('says that no change means the same values at these points, not the same library', () => {
    render(<VersionMatrixTable library="complex.js" versions={VERSIONS} suites={[SUITES[1]!]} pending={4} />);
    expect(screen.getByTestId('matrix-summary').textContent).toBe(
      '1 suite over 3 versions of complex.js: no value changed between consecutive versions. 4 more suites still being compared…',
    );
    const scope = screen.getByTestId('matrix-scope').textContent!;
    expect(scope).toContain('run on 2.3.0, 2.4.1, 2.4.3');
    expect(scope).toContain('bit for bit (zero signs included)');
    expect(scope).toContain('not the same library');
  });
});
