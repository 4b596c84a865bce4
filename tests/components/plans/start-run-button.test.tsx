import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { StartRunButton } from '../../../components/plans/start-run-button';
import type { RunView } from '../../../shared/run-view';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({ useRouter: () => ({ push: mockPush }) }));

const RUN: RunView = {
  id: '7d3f9a52-1c4e-4b8a-9f10-2a6c5e8d4b31',
  planId: 'a1b2c3d4-0000-4000-8000-000000000001',
  planName: 'complex.js nightly',
  trigger: 'manual',
  status: 'running',
  shardsTotal: 50,
  shardsDone: 12,
  counts: { pass: 1200, fail: 3, error: 0, skipped: 0 },
  regressions: null,
  requestedBy: 'Kwame Asante',
  createdAt: '2026-03-01T02:30:00Z',
  startedAt: '2026-03-01T02:30:01Z',
  finishedAt: null,
};

describe('StartRunButton', () => {
  beforeEach(() => mockPush.mockReset());

  it('opens the run it started', async () => {
    const calls = mockFetch(202, { run: { ...RUN, status: 'queued' }, existing: false });
    renderWithClient(<StartRunButton planId={RUN.planId!} planName={RUN.planName} />);
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Run complex.js nightly now' })));
    await waitFor(() => expect(mockPush).toHaveBeenCalledWith(`/runs/${RUN.id}`));
    expect(calls[0]).toMatchObject({ url: '/api/runs', init: { method: 'POST' } });
  });

  it('opens the run already in progress and marks the address so the run page says so', async () => {
    mockFetch(200, { run: RUN, existing: true });
    renderWithClient(<StartRunButton planId={RUN.planId!} planName={RUN.planName} />);
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Run complex.js nightly now' })));
    await waitFor(() => expect(mockPush).toHaveBeenCalledWith(`/runs/${RUN.id}?opened-existing=1`));
  });
});
