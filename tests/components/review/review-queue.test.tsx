import { screen, waitFor } from '@testing-library/react';
import { ReviewQueue } from '../../../components/review/review-queue';
import { renderWithClient } from '../../setup/render-with-client';

const version = (status: string) => ({
  id: 'v2',
  suiteId: 's1',
  slug: 'sqrt-on-a-circle',
  version: 2,
  status,
  body: { title: 'Square root on a circle' },
  author: { id: 'u1', displayName: 'Ravi Dutta' },
  takenOverFrom: null,
  reviewer: { id: 'u2', displayName: 'Hanne Lindqvist' },
  reviewComment: null,
  createdAt: '2026-12-05T08:00:00Z',
  submittedAt: '2026-12-05T08:01:00Z',
  reviewedAt: '2026-12-05T08:02:00Z',
});

/** The queue (now empty) and the version just decided, as the server answers them. */
function serve(status: string) {
  global.fetch = jest.fn(async (url: string | URL | Request) => {
    const body = String(url).includes('status=submitted') ? { suites: [] } : { versions: [version(status)] };
    return { ok: true, status: 200, text: async () => JSON.stringify(body) } as Response;
  }) as typeof fetch;
}

describe('ReviewQueue after a decision', () => {
  it('confirms an approval naming the suite, its version and the decision, above the updated queue', async () => {
    serve('approved');
    renderWithClient(<ReviewQueue reviewed={{ slug: 'sqrt-on-a-circle', version: 2 }} />);
    await waitFor(() =>
      expect(screen.getByTestId('review-confirmation').textContent).toBe(
        'Approved “Square root on a circle” (sqrt-on-a-circle, version 2). Plans that include it run this version from their next run.',
      ),
    );
    expect(screen.getByText('Nothing waits for review.')).toBeTruthy();
  });

  it('confirms a request for changes naming the author who will read it', async () => {
    serve('changes-requested');
    renderWithClient(<ReviewQueue reviewed={{ slug: 'sqrt-on-a-circle', version: 2 }} />);
    await waitFor(() =>
      expect(screen.getByTestId('review-confirmation').textContent).toBe(
        "Changes requested on “Square root on a circle” (sqrt-on-a-circle, version 2). Ravi Dutta sees your comment on the suite's page.",
      ),
    );
  });

  it('claims nothing when the named version was not decided', async () => {
    serve('submitted');
    renderWithClient(<ReviewQueue reviewed={{ slug: 'sqrt-on-a-circle', version: 2 }} />);
    await screen.findByText('Nothing waits for review.');
    await waitFor(() => expect(global.fetch).toHaveBeenCalledTimes(2));
    await new Promise((r) => setTimeout(r, 50));
    expect(screen.queryByTestId('review-confirmation')).toBeNull();
  });
});
