import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { StartRunButton } from '../../../components/plans/start-run-button';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';
import { RUNNING_RUN } from '../../setup/running-run';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({ useRouter: () => ({ push: mockPush }) }));

const RUN = { ...RUNNING_RUN, planId: 'a1b2c3d4-0000-4000-8000-000000000001' };

describe('StartRunButton', () => {
  beforeEach(() => mockPush.mockReset());

  it('opens the run it started', async () => {
    const calls = mockFetch(202, { run: { ...RUN, status: 'queued' }, existing: false });
    renderWithClient(<StartRunButton planId={RUN.planId!} planName={RUN.planName} />);
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Run now: complex.js nightly' })));
    await waitFor(() => expect(mockPush).toHaveBeenCalledWith(`/runs/${RUN.id}`));
    expect(calls[0]).toMatchObject({ url: '/api/runs', init: { method: 'POST' } });
  });

  it('opens the run already in progress and marks the address so the run page says so', async () => {
    mockFetch(200, { run: RUN, existing: true });
    renderWithClient(<StartRunButton planId={RUN.planId!} planName={RUN.planName} />);
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Run now: complex.js nightly' })));
    await waitFor(() => expect(mockPush).toHaveBeenCalledWith(`/runs/${RUN.id}?opened-existing=1`));
  });
});
