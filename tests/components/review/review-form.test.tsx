import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { ReviewForm } from '../../../components/review/review-form';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';

describe('ReviewForm', () => {
  it('preselects no decision, and asks for one instead of sending', async () => {
    const calls = mockFetch(200, {});
    const onReviewed = jest.fn();
    renderWithClient(<ReviewForm slug="cube-root-demo" version={2} onReviewed={onReviewed} />);
    for (const radio of screen.getAllByRole('radio')) expect(radio.getAttribute('aria-checked')).toBe('false');
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Send the decision on version 2' })));
    expect(screen.getByTestId('review-unchosen').textContent).toBe(
      '× Choose a decision first: approve, or request changes.',
    );
    expect(calls).toHaveLength(0);
    expect(onReviewed).not.toHaveBeenCalled();
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Decision: approve' })));
    expect(screen.queryByTestId('review-unchosen')).toBeNull();
  });

  it('asks for a comment before requesting changes, and sends nothing without one', async () => {
    const calls = mockFetch(200, {});
    renderWithClient(<ReviewForm slug="cube-root-demo" version={2} onReviewed={jest.fn()} />);
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Decision: request changes' })));
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Request changes to version 2' })));
    expect(screen.getByText('× Comment is required when requesting changes')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it("shows the server's four-eyes refusal as it says it", async () => {
    const calls = mockFetch(403, { kind: 'forbidden', message: 'You cannot review a suite version you wrote.' });
    const onReviewed = jest.fn();
    renderWithClient(<ReviewForm slug="cube-root-demo" version={2} onReviewed={onReviewed} />);
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Decision: approve' })));
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Approve version 2' })));
    await waitFor(() =>
      expect(screen.getByTestId('review-refusal').textContent).toBe('× You cannot review a suite version you wrote.'),
    );
    expect(onReviewed).not.toHaveBeenCalled();
    expect(calls[0]!.url).toBe('/api/suites/cube-root-demo/versions/2/review');
    expect(JSON.parse(String(calls[0]!.init.body))).toEqual({ decision: 'approve', comment: '' });
  });

  it('approves with a comment and reports the decision', async () => {
    const calls = mockFetch(200, { version: { status: 'approved' } });
    const onReviewed = jest.fn();
    renderWithClient(<ReviewForm slug="cube-root-demo" version={2} onReviewed={onReviewed} />);
    fireEvent.change(screen.getByLabelText('Comment'), { target: { value: ' Checked the loop around both ends. ' } });
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Decision: approve' })));
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Approve version 2' })));
    await waitFor(() => expect(onReviewed).toHaveBeenCalledWith('approve'));
    expect(JSON.parse(String(calls[0]!.init.body))).toEqual({
      decision: 'approve',
      comment: 'Checked the loop around both ends.',
    });
  });
});
