import { screen } from '@testing-library/react';
import { WorkerList } from '../../../components/libraries/worker-list';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

describe('WorkerList', () => {
  it('lists each live worker with the targets it has, and says so when one has none', async () => {
    fakeApiRoutes({
      'GET /api/workers': {
        status: 200,
        body: {
          workers: [
            {
              id: 'a',
              label: 'ci-a:101',
              targets: ['complex.js@2.4.2', 'glibc@2.36'],
              startedAt: '2026-12-05T06:00:00.000Z',
              heartbeatAt: '2026-12-05T06:10:00.000Z',
            },
            {
              id: 'b',
              label: 'ci-b:202',
              targets: [],
              startedAt: '2026-12-05T06:00:00.000Z',
              heartbeatAt: '2026-12-05T06:10:00.000Z',
            },
          ],
        },
      },
    });
    renderWithClient(<WorkerList />);
    const a = await screen.findByTestId('worker-ci-a:101');
    expect(a.textContent).toContain('2 targets');
    expect(a.textContent).toContain('complex.js@2.4.2, glibc@2.36');
    expect((await screen.findByTestId('worker-ci-b:202')).textContent).toContain('none: it runs no checks');
  });

  it('says that runs wait when no worker is running', async () => {
    fakeApiRoutes({ 'GET /api/workers': { status: 200, body: { workers: [] } } });
    renderWithClient(<WorkerList />);
    await screen.findByText('No worker is running: queued pairs wait until one starts.');
  });
});
