import { screen, within } from '@testing-library/react';
import { CaseDetail } from '../../../components/failures/case-detail';
import type { Diagnosis } from '../../../shared/diagnosis';
import type { FailureDetailView } from '../../../shared/failure-detail-view';
import type { FailureView } from '../../../shared/failure-view';
import { decisionViews } from '../../setup/decision-views';
import { failureRows } from '../../setup/failure-rows';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';
import { setScreenWidth } from '../../setup/set-screen-width';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

// log(z^13) at −1 + 0i (the example): complex.js's pow leaves −1.96e−15 in the imaginary
// part, so log lands on −π instead of π (DLMF 4.2.3: the principal log has Im in (−π, π]). The
// library's numbers are the issue's; the reference values are exact.
const cutSide: Diagnosis = { kind: 'cut-side' };
const lost: Diagnosis = {
  kind: 'inaccurate',
  ulps: 4.4e18,
  relativeError: 1.96e-15,
  part: 'im',
  parts: { re: { ulps: 3, absolute: 6.7e-16 }, im: { ulps: 4.4e18, absolute: 1.96e-15 } },
  cancellation: { part: 'im', absoluteError: 1.96e-15, magnitude: 1 },
};
const disagreement: Diagnosis = {
  kind: 'disagreement',
  with: 'pow(z, 0.5)',
  other: { re: '1.2246467991473532e-16', im: '2' },
  otherMatchesReference: false,
};

function caseOf(over: Partial<FailureView>, decisions: FailureDetailView['decisions'] = []): FailureDetailView {
  const f: FailureView = {
    ...failureRows(1)[0]!,
    id: '5',
    rule: 'DLMF 4.2.3',
    reproducer: 'new Complex(-1, 0).pow(13).log()',
    ...over,
  };
  return { failure: f, targetKey: 'complex.js', targetVersion: '2.4.3', history: [], decisions };
}

function serve(detail: FailureDetailView) {
  mockFetchRoutes((url) => {
    if (url.endsWith('/me'))
      return { body: { user: { id: 'u', email: 'r@x.test', displayName: 'R', role: 'reviewer' } } };
    if (url.endsWith('/failures/5')) return { body: detail };
    return { status: 409, body: { kind: 'conflict', message: 'no picture here' } };
  });
}

describe.each([
  ['phone', 390],
  ['wide screen', 1440],
])('CaseDetail on a %s', (_name, width) => {
  beforeEach(() => setScreenWidth(width));

  it('shows every label of the point, a part lost to cancellation as absolute error beside |value|, and the steps with the first that left', async () => {
    serve(
      caseOf({
        diagnosis: cutSide,
        labels: [cutSide, lost],
        steps: [
          { text: 'pow(z, 13)', library: { re: '-1', im: '-1.96e-15' }, reference: { re: '-1', im: '0' }, left: true },
          {
            text: 'log(pow(z, 13))',
            library: { re: '0', im: '-3.141592653589793' },
            reference: { re: '0', im: '3.141592653589793' },
            left: true,
          },
        ],
        firstLeftStep: 0,
      }),
    );
    renderWithClient(<CaseDetail id="5" />);
    await screen.findByText('How far off');
    expect(screen.getByLabelText('diagnosis wrong side of a cut')).toBeTruthy();
    expect(
      screen.getByLabelText(/^diagnosis inaccurate, im lost to cancellation: error 2.0e-15 beside \|value\| 1.0/),
    ).toBeTruthy();
    expect(
      screen.getByText('2 labels apply to this point; the first leads, branch labels before accuracy.'),
    ).toBeTruthy();
    const parts = screen.getByTestId('accuracy-parts');
    expect(within(parts).getByText('lost to cancellation')).toBeTruthy();
    expect(within(parts).getByText('3')).toBeTruthy();
    expect(within(parts).queryByText(/4\.4e\+18/)).toBeNull();
    expect(screen.getByTestId('cancellation').textContent).toMatch(
      /^The imaginary part is lost to cancellation: it is 2\.0e-15 off, beside a value of size \|value\| = 1\.0\./,
    );
    expect(screen.getByTestId('step-0').textContent).toContain('← first step that left the reference');
    expect(screen.getByTestId('step-0').textContent).toContain('−1 − 1.96e-15i');
    expect(screen.getByTestId('step-1').textContent).toContain('off the reference');
    // Each step is shown as typed and said as maths.
    expect(within(screen.getByTestId('step-1')).getByRole('math').getAttribute('aria-label')).toBe(
      'log of open bracket z to the power 13 close bracket',
    );
    expect(screen.getByText(/The value first left the reference at step 1/)).toBeTruthy();
  });

  it('shows both values of a disagreement beside the reference, naming the other subject, and a convention choice', async () => {
    // sqrt(−4 − 0i) = −0 − 2i under Annex G (ISO/IEC 9899:2011 G.6.4.2).
    serve(
      caseOf({
        diagnosis: disagreement,
        labels: [disagreement],
        expected: { re: '0', im: '-2' },
        actual: { re: '0', im: '2' },
        choice: 'acsc(0) is taken as asin(1/z) with 1/(+0) = +∞',
      }),
    );
    renderWithClient(<CaseDetail id="5" />);
    const box = await screen.findByTestId('disagreement');
    expect(within(box).getByText('pow(z, 0.5)')).toBeTruthy();
    expect(within(box).getByText('1.2246467991473532e-16 + 2i')).toBeTruthy();
    expect(within(box).getByText('reference')).toBeTruthy();
    expect(within(box).getByText(/Neither matches the reference/)).toBeTruthy();
    expect(screen.getByTestId('choice').textContent).toBe('acsc(0) is taken as asin(1/z) with 1/(+0) = +∞');
    expect(screen.getByText(/making a different choice, not an error in its arithmetic/)).toBeTruthy();
    expect(screen.queryByText('How far off')).toBeNull();
  });

  it('shows the decisions that cover the failure, by whom and until when, each linked on the Decisions screen', async () => {
    const [inForce, , expired] = decisionViews();
    serve(caseOf({}, [inForce!, expired!]));
    renderWithClient(<CaseDetail id="5" />);
    await screen.findByText('Decisions on this failure');
    const shown = screen.getByTestId(`decision-${inForce!.id}`);
    expect(within(shown).getByText(/in force until 2099-01-31/)).toBeTruthy();
    expect(within(shown).getByText(/^Decided by Hanne Lindqvist on/)).toBeTruthy();
    expect(within(screen.getByTestId(`decision-${expired!.id}`)).getByText(/expired on 2026-11-30/)).toBeTruthy();
    expect(
      screen.getAllByRole('link', { name: /decision on the Decisions screen$/ }).map((l) => l.getAttribute('href')),
    ).toEqual([`/decisions?id=${inForce!.id}`, `/decisions?id=${expired!.id}`]);
  });

  it('says so when no decision covers the failure', async () => {
    serve(caseOf({}));
    renderWithClient(<CaseDetail id="5" />);
    expect(await screen.findByText(/^No decision covers this failure/)).toBeTruthy();
  });
});
