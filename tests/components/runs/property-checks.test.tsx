import { act, fireEvent, render, screen, within } from '@testing-library/react';
import { PropertyChecks } from '../../../components/runs/property-checks';
import { setScreenWidth } from '../../setup/set-screen-width';
import type { RunPropertyRow } from '../../../shared/run-property-row';

// Invented rows for the screen only; the laws' own checks are tested under tests/harness.
const held = (suite: string, law: RunPropertyRow['outcome']['law']): RunPropertyRow => ({
  suite,
  target: 'complex.js@2.4.3',
  outcome: {
    kind: 'held',
    law,
    title: `${law} holds`,
    seed: 42,
    runs: 200,
    excluded: 0,
    statement: 'At the drawn points only.',
  },
});

const rows: RunPropertyRow[] = [
  held('sqrt-principal-sz', 'conjugate-symmetry'),
  held('sqrt-principal-sz', 'root-power'),
  held('log-principal-sz', 'exp-log'),
  {
    suite: 'log-principal-sz',
    target: 'complex.js@2.4.3',
    outcome: {
      kind: 'failed',
      law: 'conjugate-symmetry',
      title: 'log(conj z) = conj(log z) off the cut',
      seed: 7,
      runs: 13,
      path: '12:0:0',
      shrinks: 3,
      counterexample: [{ re: '-1', im: '-0' }],
      reason: 'the imaginary parts differ in sign',
      values: [
        { name: 'f(conj z)', value: { re: '0', im: '3.141592653589793' } },
        { name: 'conj f(z)', value: { re: '0', im: '-3.141592653589793' } },
      ],
      sides: ['f(conj z)', 'conj f(z)'],
    },
  },
  {
    suite: 'acos-principal-sz',
    target: 'complex.js@2.4.3',
    outcome: {
      kind: 'not-checked',
      law: 'range',
      title: 'acos lands in its range',
      seed: 9,
      reason: 'the run was cancelled first',
    },
  },
];

describe('PropertyChecks', () => {
  beforeEach(() => setScreenWidth(1440));

  it('counts the checks by outcome and lists pairs with a failure first, then unchecked, then held', () => {
    render(<PropertyChecks rows={rows} />);
    expect(screen.getByTestId('property-summary').textContent).toBe(
      '5 checks over 3 pairs: 1 failed, 1 not checked, 3 held.',
    );
    const pairs = screen.getAllByTestId(/^property-pair-/).map((el) => el.getAttribute('data-testid'));
    expect(pairs).toEqual([
      'property-pair-log-principal-sz × complex.js@2.4.3',
      'property-pair-acos-principal-sz × complex.js@2.4.3',
      'property-pair-sqrt-principal-sz × complex.js@2.4.3',
    ]);
  });

  it('shows a failing pair open, with its counterexample, both sides of the law, seed and replay path', () => {
    render(<PropertyChecks rows={rows} />);
    const failed = screen.getByTestId('property-log-principal-sz × complex.js@2.4.3-conjugate-symmetry');
    expect(within(failed).getByText('counterexample (shrunk 3 times, after 13 runs): z = −1 − 0i')).toBeTruthy();
    const sides = within(failed)
      .getAllByText(/side$/)
      .map((el) => `${el.textContent} ${el.nextSibling?.textContent}`);
    expect(sides).toEqual([
      'left side f(conj z) = 0 + 3.141592653589793i',
      'right side conj f(z) = 0 − 3.141592653589793i',
    ]);
    expect(within(failed).getByText('replay with fast-check: seed 7, path "12:0:0"')).toBeTruthy();
    expect(within(failed).getByText('seed 7')).toBeTruthy();
    // Its held law stays visible beside the failure: the pair is open as a whole.
    expect(screen.getByTestId('property-log-principal-sz × complex.js@2.4.3-exp-log')).toBeTruthy();
  });

  it('folds a pair whose every law held into one line, and opens it on a tap', async () => {
    render(<PropertyChecks rows={rows} />);
    expect(screen.queryByTestId('property-sqrt-principal-sz × complex.js@2.4.3-root-power')).toBeNull();
    const fold = screen.getByRole('button', {
      name: 'sqrt-principal-sz × complex.js@2.4.3: all 2 laws held; show them',
    });
    expect(fold.textContent).toMatch(/✓ all 2 laws held/);
    await act(() => fireEvent.click(fold));
    expect(screen.getByTestId('property-sqrt-principal-sz × complex.js@2.4.3-root-power')).toBeTruthy();
    expect(
      screen
        .getByRole('button', { name: 'sqrt-principal-sz × complex.js@2.4.3: all 2 laws held; hide them' })
        .getAttribute('aria-expanded'),
    ).toBe('true');
  });

  it('folds every pair on a phone to one line of counts, failures first, and opens one on a tap', async () => {
    setScreenWidth(390);
    render(<PropertyChecks rows={rows} />);
    expect(screen.queryByTestId('property-log-principal-sz × complex.js@2.4.3-conjugate-symmetry')).toBeNull();
    const folds = screen.getAllByRole('button').map((b) => b.textContent);
    expect(folds).toEqual([
      'log-principal-sz × complex.js@2.4.3❌ 1 failed · ✓ 1 held',
      'acos-principal-sz × complex.js@2.4.3− 1 not checked',
      'sqrt-principal-sz × complex.js@2.4.3✓ all 2 laws held',
    ]);
    await act(() =>
      fireEvent.click(
        screen.getByRole('button', {
          name: 'log-principal-sz × complex.js@2.4.3: ❌ 1 failed · ✓ 1 held; show the 2 laws checked',
        }),
      ),
    );
    expect(screen.getByTestId('property-log-principal-sz × complex.js@2.4.3-conjugate-symmetry')).toBeTruthy();
  });
});

describe('PropertyChecks over several library versions', () => {
  const onBoth = (target: string): RunPropertyRow[] =>
    rows.filter((r) => r.suite !== 'acos-principal-sz').map((r) => ({ ...r, target }));
  const twice = [...onBoth('complex.js@2.4.2'), ...onBoth('complex.js@2.4.3')];

  it('shows a suite whose laws came out the same on both versions once, naming both, and still counts each pair', () => {
    setScreenWidth(1440);
    render(<PropertyChecks rows={twice} />);
    expect(screen.getByTestId('property-summary').textContent).toBe(
      '8 checks over 4 pairs: 2 failed, 0 not checked, 6 held.',
    );
    expect(screen.getAllByTestId(/^property-pair-/).map((el) => el.getAttribute('data-testid'))).toEqual([
      'property-pair-log-principal-sz × complex.js@2.4.2 and complex.js@2.4.3',
      'property-pair-sqrt-principal-sz × complex.js@2.4.2 and complex.js@2.4.3',
    ]);
    expect(
      screen.getByText('log-principal-sz × complex.js@2.4.2 and complex.js@2.4.3 (the same on both)'),
    ).toBeTruthy();
    expect(
      screen.getByRole('button', {
        name: 'sqrt-principal-sz × complex.js@2.4.2 and complex.js@2.4.3: all 2 laws held on both; show them',
      }).textContent,
    ).toMatch(/✓ all 2 laws held on both/);
  });

  it('keeps the versions apart where one outcome differs, down to the counterexample', () => {
    setScreenWidth(390);
    const differ = twice.map((r) =>
      r.target === 'complex.js@2.4.3' && r.outcome.kind === 'failed'
        ? { ...r, outcome: { ...r.outcome, counterexample: [{ re: '-2', im: '-0' }] } }
        : r,
    );
    render(<PropertyChecks rows={differ} />);
    expect(screen.getAllByRole('button').map((b) => b.textContent)).toEqual([
      'log-principal-sz × complex.js@2.4.2❌ 1 failed · ✓ 1 held',
      'log-principal-sz × complex.js@2.4.3❌ 1 failed · ✓ 1 held',
      'sqrt-principal-sz × complex.js@2.4.2 and complex.js@2.4.3✓ all 2 laws held on both',
    ]);
  });
});
