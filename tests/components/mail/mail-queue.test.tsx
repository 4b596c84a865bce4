import { screen, waitFor } from '@testing-library/react';
import { MailQueue } from '../../../components/mail/mail-queue';
import type { OutboxMailView } from '../../../shared/outbox-mail-view';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';

const mail = (over: Partial<OutboxMailView>): OutboxMailView => ({
  id: '5a4b3c2d-1e0f-4a9b-8c7d-6e5f4a3b2c1d',
  kind: 'regression',
  subject: '[Sheetkeeper] 3 regressions in complex.js nightly',
  recipients: ['kwame@sheetkeeper.test'],
  status: 'pending',
  attempts: 0,
  lastError: null,
  nextAttemptAt: '2026-03-01T10:00:00.000Z',
  createdAt: '2026-03-01T09:59:00.000Z',
  ...over,
});

describe('MailQueue', () => {
  it('shows a mail that failed after the capped attempts, with the reason in words', async () => {
    mockFetch(200, {
      mails: [
        mail({
          status: 'failed',
          attempts: 5,
          lastError: 'Not delivered after 5 attempts; the last: connect ECONNREFUSED 127.0.0.1:2525',
        }),
      ],
    });
    renderWithClient(<MailQueue />);
    await waitFor(() => expect(screen.getByText('× Not delivered')).toBeTruthy());
    expect(
      screen.getByText('Not delivered after 5 attempts; the last: connect ECONNREFUSED 127.0.0.1:2525'),
    ).toBeTruthy();
    expect(screen.getByText('[Sheetkeeper] 3 regressions in complex.js nightly')).toBeTruthy();
  });

  it('says a mail the relay never confirmed may have arrived and is not sent again', async () => {
    mockFetch(200, {
      mails: [
        mail({
          status: 'unconfirmed',
          attempts: 1,
          lastError:
            'The relay did not answer within 60 s after the connection opened; the mail may have arrived, so it is not sent again.',
        }),
      ],
    });
    renderWithClient(<MailQueue />);
    await waitFor(() => expect(screen.getByText('? May have arrived, not sent again')).toBeTruthy());
    expect(screen.getByText(/may have arrived, so it is not sent again/)).toBeTruthy();
  });

  it('shows a waiting mail with its next attempt out of the cap and the last reason', async () => {
    mockFetch(200, { mails: [mail({ attempts: 2, lastError: 'Greeting never received' })] });
    renderWithClient(<MailQueue />);
    await waitFor(() => expect(screen.getByText('… Waiting to send')).toBeTruthy());
    expect(screen.getByText(/^Attempt 3 of 5 at .*Last try: Greeting never received$/)).toBeTruthy();
  });

  it('shows nothing when every mail was delivered', async () => {
    const calls = mockFetch(200, { mails: [] });
    renderWithClient(<MailQueue />);
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(screen.queryByTestId('mail-queue')).toBeNull();
  });
});
