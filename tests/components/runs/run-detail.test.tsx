import { screen, waitFor } from '@testing-library/react';
import { RunDetail } from '../../../components/runs/run-detail';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';
import { RUNNING_RUN } from '../../setup/running-run';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const answer = (url: string) =>
  url.endsWith('/matrix')
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
});
