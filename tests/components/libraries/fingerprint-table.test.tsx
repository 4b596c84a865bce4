import { fireEvent, render, screen } from '@testing-library/react';
import { FingerprintTable } from '../../../components/libraries/fingerprint-table';
import type { ConventionFingerprint } from '../../../shared/convention-fingerprint';

const r = (re: string, im: string) => ({ re, im });

/** complex.js 2.4.3 as the harness fingerprints it on sqrt and log (two of the four places each), and a cut no place could separate. */
const FINGERPRINT: ConventionFingerprint = {
  target: 'complex.js@2.4.3',
  statement:
    'Evidence at 48 points: on each cut at the places listed … not a certification of the library elsewhere on the cut or off it.',
  missing: ['cbrt', 'nthroot(z, 3)'],
  cuts: [
    {
      function: 'sqrt',
      cut: '(-inf, 0]',
      behaviour: 'inconsistent',
      alone: 'counter-clockwise',
      disagreesWith: ['log'],
      // As the harness carries it (fingerprint-target.ts): ISO/IEC 9899:2011 G.6.4.2 and G.6.3.2 values at −0.5 − 0i.
      disagreements: [
        {
          with: 'log',
          at: r('-0.5', '0'),
          sides: [
            {
              function: 'sqrt',
              at: r('-0.5', '-0'),
              value: r('0', '0.7071067811865476'),
              reference: {
                'signed-zero': r('0', '-0.7071067811865476'),
                'counter-clockwise': r('0', '0.7071067811865476'),
              },
              follows: 'counter-clockwise',
            },
            {
              function: 'log',
              at: r('-0.5', '-0'),
              value: r('-0.6931471805599453', '-3.141592653589793'),
              reference: {
                'signed-zero': r('-0.6931471805599453', '-3.141592653589793'),
                'counter-clockwise': r('-0.6931471805599453', '3.141592653589793'),
              },
              follows: 'signed-zero',
            },
          ],
        },
      ],
      probes: [
        {
          at: r('-0.5', '0'),
          verdict: 'counter-clockwise',
          plusZero: r('0', '0.7071067811865476'),
          minusZero: r('0', '0.7071067811865476'),
        },
        { at: r('-1', '0'), verdict: 'counter-clockwise', plusZero: r('0', '1'), minusZero: r('0', '1') },
      ],
    },
    {
      function: 'log',
      cut: '(-inf, 0]',
      behaviour: 'inconsistent',
      alone: 'signed-zero',
      disagreesWith: ['sqrt'],
      probes: [
        {
          at: r('-0.5', '0'),
          verdict: 'signed-zero',
          plusZero: r('-0.6931471805599453', '3.141592653589793'),
          minusZero: r('-0.6931471805599453', '-3.141592653589793'),
        },
        {
          at: r('-1', '0'),
          verdict: 'signed-zero',
          plusZero: r('0', '3.141592653589793'),
          minusZero: r('0', '-3.141592653589793'),
        },
      ],
    },
    {
      function: 'atan',
      cut: '[1, +inf)·i',
      behaviour: 'signed-zero',
      alone: 'signed-zero',
      disagreesWith: [],
      probes: [
        {
          at: r('0', '2'),
          verdict: 'signed-zero',
          plusZero: r('1.5707963267948966', '0.5493061443340549'),
          minusZero: r('-1.5707963267948966', '0.5493061443340549'),
        },
      ],
    },
    { function: 'acot', cut: '[-1, 1]·i', behaviour: 'neither', alone: 'neither', disagreesWith: [], probes: [] },
  ],
};

describe('FingerprintTable', () => {
  it('names each verdict in words with its own glyph, not by colour alone', () => {
    render(<FingerprintTable fingerprint={FINGERPRINT} />);
    const sqrt = screen.getByTestId('fingerprint-sqrt-(-inf, 0]');
    expect(sqrt.textContent).toContain('≠inconsistent');
    expect(sqrt.textContent).toContain('On its own ↺ counter-clockwise; disagrees with log on the same cut');
    expect(screen.getByTestId('fingerprint-log-(-inf, 0]').textContent).toContain(
      'On its own ± signed zero; disagrees with sqrt on the same cut',
    );
    expect(screen.getByTestId('fingerprint-atan-[1, +inf)·i').textContent).toContain('±signed zero');
    expect(screen.getAllByLabelText('inconsistent')).toHaveLength(2);
    expect(screen.getByLabelText('signed zero')).toBeTruthy();
  });

  it('says how many places each verdict rests on, and when it rests on none', () => {
    render(<FingerprintTable fingerprint={FINGERPRINT} />);
    expect(screen.getByTestId('fingerprint-sqrt-(-inf, 0]').textContent).toContain(
      'counter-clockwise at 2 of 2 places',
    );
    expect(screen.getByTestId('fingerprint-atan-[1, +inf)·i').textContent).toContain('signed zero at 1 of 1 place');
    const acot = screen.getByTestId('fingerprint-acot-[-1, 1]·i');
    expect(acot.textContent).toContain('this verdict rests on no evidence');
    expect(screen.queryByRole('button', { name: /places probed for acot/ })).toBeNull();
  });

  it('shows the places probed, with the value at +0 and at −0, when asked', () => {
    render(<FingerprintTable fingerprint={FINGERPRINT} />);
    const toggle = screen.getByRole('button', { name: 'Show 2 places probed for log on (-inf, 0]' });
    expect(toggle.getAttribute('aria-expanded')).toBe('false');
    expect(screen.queryByText('z = −0.5 ± 0i')).toBeNull();
    fireEvent.click(toggle);
    expect(
      screen.getByRole('button', { name: 'Hide 2 places probed for log on (-inf, 0]' }).getAttribute('aria-expanded'),
    ).toBe('true');
    const places = screen.getByLabelText('Places probed for log on (-inf, 0]');
    expect(places.textContent).toContain('z = −0.5 ± 0i');
    expect(places.textContent).toContain('with +0 → −0.6931471805599453 + 3.141592653589793i');
    expect(places.textContent).toContain('with −0 → −0.6931471805599453 − 3.141592653589793i');
    expect(places.textContent).toContain('votes ± signed zero');
  });

  it('writes a place on an imaginary-axis cut with the zero sign on the real part', () => {
    render(<FingerprintTable fingerprint={FINGERPRINT} />);
    fireEvent.click(screen.getByRole('button', { name: 'Show 1 place probed for atan on [1, +inf)·i' }));
    expect(screen.getByText('z = ±0 + 2i')).toBeTruthy();
  });

  it('states what was checked and what was not, naming the functions the target lacks', () => {
    render(<FingerprintTable fingerprint={FINGERPRINT} />);
    const scope = screen.getByTestId('fingerprint-scope').textContent!;
    expect(scope).toContain('5 places that separate the conventions, over 4 cuts');
    expect(scope).toContain('with +0 and with −0');
    expect(scope).toContain('Not checked: the rest of each cut');
    expect(scope).toContain('(cbrt, nthroot(z, 3))');
    expect(scope).toContain('not a certification');
    expect(screen.getByTestId('fingerprint-summary').textContent).toContain('4 function–cut pairs of 4 functions');
  });

  it('leads from "disagrees with" to a point where the two functions part ways, with both values and both references', () => {
    render(<FingerprintTable fingerprint={FINGERPRINT} />);
    expect(screen.queryByTestId('fingerprint-disagreement-sqrt-log')).toBeNull();
    const link = screen.getByRole('link', { name: 'Where sqrt and log part ways' });
    fireEvent.click(link);
    const detail = screen.getByTestId('fingerprint-disagreement-sqrt-log').textContent!;
    expect(detail).toContain('Near z = −0.5 ± 0i on (-inf, 0], sqrt and log follow different conventions');
    expect(detail).toContain('sqrt(−0.5 − 0i) gives 0 + 0.7071067811865476i: ↺ the counter-clockwise value');
    expect(detail).toContain('log(−0.5 − 0i) gives −0.6931471805599453 − 3.141592653589793i: ± the signed zero value');
    expect(detail).toContain(
      'reference: signed zero 0 − 0.7071067811865476i, counter-clockwise 0 + 0.7071067811865476i',
    );
    // log's row has no detail to lead to (a fingerprint made before carries none): its words stay plain.
    expect(screen.queryByRole('link', { name: 'Where log and sqrt part ways' })).toBeNull();
    fireEvent.click(link);
    expect(screen.queryByTestId('fingerprint-disagreement-sqrt-log')).toBeNull();
  });

  it("opens a function's cut map", () => {
    const onOpenCutMap = jest.fn();
    render(<FingerprintTable fingerprint={FINGERPRINT} onOpenCutMap={onOpenCutMap} />);
    fireEvent.click(screen.getAllByRole('link', { name: 'Cut map of log' })[0]!);
    expect(onOpenCutMap).toHaveBeenCalledWith('log');
  });
});
