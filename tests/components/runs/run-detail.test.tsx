import { screen, waitFor } from '@testing-library/react';
import { RunDetail } from '../../../components/runs/run-detail';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';
import { RUNNING_RUN } from '../../setup/running-run';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const WORKERS = [
  {
    id: 'w1',
    label: 'build-7:4121',
    targets: ['complex.js@2.4.3'],
    startedAt: '2026-03-01T02:00:00Z',
    heartbeatAt: '2026-03-01T02:30:00Z',
  },
];

const answer = (url: string) =>
  url.endsWith('/workers')
    ? { body: { workers: WORKERS } }
    : url.endsWith('/matrix')
      ? { body: { cells: [] } }
      : url.endsWith('/properties')
        ? { body: { properties: [] } }
        : url.endsWith('/me')
          ? {
              body: {
                user: { id: 'u1', email: 'kwame@sheetkeeper.test', displayName: 'Kwame Asante', role: 'maintainer' },
              },
            }
          : { body: { run: RUNNING_RUN } };

describe('RunDetail', () => {
  it('says plainly when Run now opened the run already in progress instead of starting another', async () => {
    mockFetchRoutes(answer);
    renderWithClient(<RunDetail id={RUNNING_RUN.id} openedExisting />);
    await waitFor(() => expect(screen.getByTestId('opened-existing-run')).toBeTruthy());
    expect(screen.getByTestId('opened-existing-run').textContent).toBe(
      'This plan already had a run in progress, so Run now opened it instead of starting a second one.',
    );
  });

  it('shows no such note for a run opened any other way', async () => {
    mockFetchRoutes(answer);
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    await waitFor(() => expect(screen.getByText('complex.js nightly')).toBeTruthy());
    expect(screen.queryByTestId('opened-existing-run')).toBeNull();
  });

  it('says which workers are running, and that pairs wait for a worker with their target when none has it', async () => {
    mockFetchRoutes((url) =>
      url.endsWith(`/runs/${RUNNING_RUN.id}`)
        ? { body: { run: { ...RUNNING_RUN, waitingFor: ['complex.js@2.5.0'] } } }
        : answer(url),
    );
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    await waitFor(() => expect(screen.getByTestId('live-workers')).toBeTruthy());
    expect(screen.getByTestId('live-workers').textContent).toBe('1 worker: build-7:4121 (1 target)');
    expect(screen.getByTestId('run-waiting-for-worker').textContent).toBe(
      'Waiting for a worker that has complex.js@2.5.0; none is running. These checks start once such a worker starts (npm run worker on a machine that has it).',
    );
  });

  it('says nothing of waiting while every pair has a worker', async () => {
    mockFetchRoutes(answer);
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    await waitFor(() => expect(screen.getByTestId('live-workers')).toBeTruthy());
    expect(screen.queryByTestId('run-waiting-for-worker')).toBeNull();
  });

  it("leads with the run's short id and leaves what a check is to the matrix heading, which says it once", async () => {
    mockFetchRoutes(answer);
    renderWithClient(<RunDetail id={RUNNING_RUN.id} />);
    await waitFor(() => expect(screen.getByText(`Run ${RUNNING_RUN.id.slice(0, 8)} of this plan.`)).toBeTruthy());
    expect(screen.getAllByText(/each suite against each library version/i).map((el) => el.textContent)).toEqual([
      'Each suite against each library version',
    ]);
  });
});
