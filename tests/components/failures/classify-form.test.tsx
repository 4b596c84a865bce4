import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { ClassifyForm } from '../../../components/failures/classify-form';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';

const type = (label: string | RegExp, value: string) =>
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
const press = (name: string) => act(() => fireEvent.click(screen.getByRole('button', { name })));

/** Failure 7: a zero-sign failure on path "a" of sqrt-principal, run on complex.js 2.4.3. */
const failure = (diagnosisKind: string | null = 'zero-sign') => ({
  id: '7',
  targetKey: 'complex.js',
  targetVersion: '2.4.3',
  suiteSlug: 'sqrt-principal',
  pathName: 'a',
  diagnosisKind,
});

describe('ClassifyForm', () => {
  it('offers a maintainer only an accepted deviation, and names each missing field beside it without sending', async () => {
    const calls = mockFetch(201, {});
    renderWithClient(<ClassifyForm failure={failure()} role="maintainer" />);
    expect(screen.getAllByRole('radio', { name: /^Verdict:/ }).map((r) => r.getAttribute('aria-label'))).toEqual([
      'Verdict: accepted deviation',
    ]);
    await press('Accept deviation');
    expect(screen.getByText('× Reason must say why (at least 3 characters)')).toBeTruthy();
    expect(screen.getByText('× Expiry day is required for an accepted deviation')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it('refuses an expiry in the past with the shared rule', async () => {
    const calls = mockFetch(201, {});
    renderWithClient(<ClassifyForm failure={failure()} role="reviewer" />);
    fireEvent.click(screen.getByRole('radio', { name: 'Verdict: accepted deviation' }));
    type('Reason', 'documented upstream');
    type(/Expires on/, '2001-01-01');
    await press('Accept deviation');
    expect(screen.getByText('× Expiry day must be a day after today (UTC)')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it('asks a reviewer for a verdict first, and offers no diagnosis scope for an error', async () => {
    mockFetch(201, {});
    renderWithClient(<ClassifyForm failure={failure(null)} role="reviewer" />);
    expect(screen.getAllByRole('radio', { name: /^Verdict:/ })).toHaveLength(3);
    expect(screen.queryByRole('radio', { name: 'Covers: this diagnosis in the suite' })).toBeNull();
    type('Reason', 'reported upstream');
    await press('Record verdict');
    expect(screen.getByText(/× Verdict must be bug, convention-difference or accepted/)).toBeTruthy();
  });

  it('posts a valid verdict with the day as midnight UTC and confirms it in the words of its scope', async () => {
    const calls = mockFetch(201, {
      deviation: {
        id: 'd1',
        classification: 'accepted',
        scope: 'path',
        versions: 'this-version',
        targetKey: 'complex.js',
        targetVersion: '2.4.3',
        suiteSlug: 'sqrt-principal',
        pathName: 'a',
        diagnosisKind: null,
        failureId: '7',
        expiresAt: '2099-06-30T00:00:00.000Z',
      },
    });
    renderWithClient(<ClassifyForm failure={failure()} role="maintainer" />);
    fireEvent.click(screen.getByRole('radio', { name: 'Covers: this path' }));
    type('Reason', '  complex.js drops the sign of zero  ');
    type(/Expires on/, '2099-06-30');
    await press('Accept deviation');
    await screen.findByText(
      '✓ Recorded: accepted deviation covering every failure on path “a” of suite sqrt-principal on complex.js 2.4.3 only, until 2099-06-30. It is listed on the Decisions screen.',
    );
    expect(calls[0]!.url).toBe('/api/failures/7/classify');
    expect(JSON.parse(String(calls[0]!.init.body))).toEqual({
      classification: 'accepted',
      scope: 'path',
      versions: 'this-version',
      reason: 'complex.js drops the sign of zero',
      expiresAt: '2099-06-30T00:00:00Z',
    });
  });

  it("shows the server's rule beside its field and keeps what was typed", async () => {
    mockFetch(400, {
      kind: 'invalid-input',
      message: 'Invalid input.',
      issues: [{ field: 'body.reason', rule: 'must not repeat an earlier verdict' }],
    });
    renderWithClient(<ClassifyForm failure={failure()} role="reviewer" />);
    fireEvent.click(screen.getByRole('radio', { name: 'Verdict: bug' }));
    type('Reason', 'seen before');
    await press('Record verdict');
    await waitFor(() => expect(screen.getByText('× Reason must not repeat an earlier verdict')).toBeTruthy());
    expect((screen.getByLabelText('Reason') as HTMLTextAreaElement).value).toBe('seen before');
  });

  it('shows a refusal that belongs to no field above the button', async () => {
    mockFetch(403, {
      kind: 'forbidden',
      message:
        'A maintainer may accept a deviation; calling a failure a bug or a convention difference needs the role reviewer or admin.',
    });
    renderWithClient(<ClassifyForm failure={failure()} role="reviewer" />);
    fireEvent.click(screen.getByRole('radio', { name: 'Verdict: convention difference' }));
    type('Reason', 'follows the counter-clockwise rule');
    await press('Record verdict');
    await screen.findByText(/× A maintainer may accept a deviation/);
    expect((screen.getByLabelText('Reason') as HTMLTextAreaElement).value).toBe('follows the counter-clockwise rule');
  });

  it('marks the accepted chip as chosen only while it is chosen, with a drawn ring and never a ✓', () => {
    mockFetch(201, {});
    renderWithClient(<ClassifyForm failure={failure()} role="reviewer" />);
    const accepted = () => screen.getByRole('radio', { name: 'Verdict: accepted deviation' });
    const ringed = () => within(accepted()).queryByTestId('chosen-mark') !== null;
    expect([accepted().textContent, ringed()]).toEqual(['accepted deviation', false]);
    fireEvent.click(accepted());
    expect([accepted().textContent, ringed()]).toEqual(['accepted deviation', true]);
    fireEvent.click(screen.getByRole('radio', { name: 'Verdict: bug' }));
    expect([accepted().textContent, ringed()]).toEqual(['accepted deviation', false]);
  });

  it('states which failures, library and versions the verdict covers before saving, and sends what it said', async () => {
    const calls = mockFetch(201, {
      deviation: {
        ...failure(),
        id: 'd2',
        classification: 'bug',
        scope: 'diagnosis',
        versions: 'every-version',
        pathName: null,
        failureId: '7',
        expiresAt: null,
      },
    });
    renderWithClient(<ClassifyForm failure={failure()} role="reviewer" />);
    const said = () => screen.getByTestId('decision-scope').textContent;
    expect(said()).toBe('Saving covers the point of failure #7 in suite sqrt-principal on complex.js 2.4.3 only.');
    fireEvent.click(screen.getByRole('radio', { name: 'Covers: this diagnosis in the suite' }));
    fireEvent.click(screen.getByRole('radio', { name: 'Versions of complex.js: 2.4.3 and later' }));
    expect(said()).toBe(
      'Saving covers every failure diagnosed “ignored zero sign” in suite sqrt-principal on complex.js 2.4.3 and every later version.',
    );
    fireEvent.click(screen.getByRole('radio', { name: 'Versions of complex.js: every version, earlier ones too' }));
    expect(said()).toBe(
      'Saving covers every failure diagnosed “ignored zero sign” in suite sqrt-principal on every version of complex.js, earlier ones and runs already stored included.',
    );
    fireEvent.click(screen.getByRole('radio', { name: 'Verdict: bug' }));
    type('Reason', 'reported upstream');
    await press('Record verdict');
    expect(JSON.parse(String(calls[0]!.init.body))).toMatchObject({ scope: 'diagnosis', versions: 'every-version' });
    await screen.findByText(
      '✓ Recorded: bug covering every failure diagnosed “ignored zero sign” in suite sqrt-principal on every version of complex.js, earlier ones and runs already stored included. It is listed on the Decisions screen.',
    );
  });

  it('answers a badly written expiry in the words of the field, not with a timestamp format', async () => {
    const calls = mockFetch(201, {});
    renderWithClient(<ClassifyForm failure={failure()} role="maintainer" />);
    type('Reason', 'documented upstream');
    for (const typed of ['31/01/2027', '2027-02-30', 'soon']) {
      type(/Expires on/, typed);
      await press('Accept deviation');
      expect(screen.getByText('× Expiry day must be a day written like 2027-01-31 (year-month-day)')).toBeTruthy();
    }
    expect(screen.queryByText(/T00:00:00Z/)).toBeNull();
    expect(calls).toHaveLength(0);
  });
});
