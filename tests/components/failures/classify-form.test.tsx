import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { ClassifyForm } from '../../../components/failures/classify-form';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';

const type = (label: string | RegExp, value: string) =>
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
const press = (name: string) => act(() => fireEvent.click(screen.getByRole('button', { name })));

describe('ClassifyForm', () => {
  it('offers a maintainer only an accepted deviation, and names each missing field beside it without sending', async () => {
    const calls = mockFetch(201, {});
    renderWithClient(<ClassifyForm failureId="7" role="maintainer" hasDiagnosis />);
    expect(screen.getAllByRole('radio', { name: /^Verdict:/ }).map((r) => r.getAttribute('aria-label'))).toEqual([
      'Verdict: accepted deviation',
    ]);
    await press('Accept deviation');
    expect(screen.getByText('× Reason must say why (at least 3 characters)')).toBeTruthy();
    expect(screen.getByText('× Expiry is required for an accepted deviation')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it('refuses an expiry in the past with the shared rule', async () => {
    const calls = mockFetch(201, {});
    renderWithClient(<ClassifyForm failureId="7" role="reviewer" hasDiagnosis />);
    fireEvent.click(screen.getByRole('radio', { name: 'Verdict: accepted deviation' }));
    type('Reason', 'documented upstream');
    type(/Expires on/, '2001-01-01');
    await press('Accept deviation');
    expect(screen.getByText('× Expiry must lie in the future')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it('asks a reviewer for a verdict first, and offers no diagnosis scope for an error', async () => {
    mockFetch(201, {});
    renderWithClient(<ClassifyForm failureId="7" role="reviewer" hasDiagnosis={false} />);
    expect(screen.getAllByRole('radio', { name: /^Verdict:/ })).toHaveLength(3);
    expect(screen.queryByRole('radio', { name: 'Covers: this diagnosis in the suite' })).toBeNull();
    type('Reason', 'reported upstream');
    await press('Record verdict');
    expect(screen.getByText(/× Verdict must be bug, convention-difference or accepted/)).toBeTruthy();
  });

  it('posts a valid verdict with the day as midnight UTC and confirms it', async () => {
    const calls = mockFetch(201, {
      deviation: { id: 'd1', classification: 'accepted', scope: 'path', expiresAt: '2099-06-30T00:00:00.000Z' },
    });
    renderWithClient(<ClassifyForm failureId="7" role="maintainer" hasDiagnosis />);
    fireEvent.click(screen.getByRole('radio', { name: 'Covers: this path' }));
    type('Reason', '  complex.js drops the sign of zero  ');
    type(/Expires on/, '2099-06-30');
    await press('Accept deviation');
    await screen.findByText('✓ Recorded: accepted deviation for this path, until 2099-06-30.');
    expect(calls[0]!.url).toBe('/api/failures/7/classify');
    expect(JSON.parse(String(calls[0]!.init.body))).toEqual({
      classification: 'accepted',
      scope: 'path',
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
    renderWithClient(<ClassifyForm failureId="7" role="reviewer" hasDiagnosis />);
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
    renderWithClient(<ClassifyForm failureId="7" role="reviewer" hasDiagnosis />);
    fireEvent.click(screen.getByRole('radio', { name: 'Verdict: convention difference' }));
    type('Reason', 'follows the counter-clockwise rule');
    await press('Record verdict');
    await screen.findByText(/× A maintainer may accept a deviation/);
    expect((screen.getByLabelText('Reason') as HTMLTextAreaElement).value).toBe('follows the counter-clockwise rule');
  });
});
